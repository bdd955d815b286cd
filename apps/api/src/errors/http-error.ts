import type { FieldError } from '@tunnelwright/contracts';

/** An error the client should see as-is: a status, a short title, an optional detail and field errors. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly title: string,
    readonly detail?: string,
    readonly errors?: FieldError[],
  ) {
    super(detail ?? title);
    this.name = 'HttpError';
  }

  /** A 400 naming one failing field. */
  static field(field: string, message: string): HttpError {
    return new HttpError(400, 'Some fields need attention', message, [{ field, message }]);
  }

  static notFound(what: string): HttpError {
    return new HttpError(404, 'Not found', `${what} was not found.`);
  }
}
