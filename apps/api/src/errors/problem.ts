import type { FieldError, Problem } from '@tunnelwright/contracts';
import {
  CheckViolationError,
  ConstraintViolationError,
  DataError,
  ForeignKeyViolationError,
  NotFoundError,
  NotNullViolationError,
  UniqueViolationError,
  ValidationError,
} from 'objection';
import { ZodError } from 'zod';
import { HttpError } from './http-error';

const typeBase = 'https://tunnelwright.invalid/problems/';

/** Friendly words for unique columns, so a 409 can say which field clashed. */
const uniqueMessages: Record<string, string> = {
  email: 'This e-mail address is already in use',
  name: 'This name is already in use',
};

function problem(status: number, slug: string, title: string, detail?: string, errors?: FieldError[]): Problem {
  return { type: `${typeBase}${slug}`, title, status, ...(detail ? { detail } : {}), ...(errors ? { errors } : {}) };
}

function slugFor(status: number): string {
  const slugs: Record<number, string> = {
    400: 'validation',
    401: 'unauthenticated',
    403: 'forbidden',
    404: 'not-found',
    409: 'conflict',
    410: 'gone',
    413: 'too-large',
    429: 'too-many-requests',
    503: 'unavailable',
  };
  return slugs[status] ?? 'error';
}

/** Turns zod issues into dotted-path field errors; an issue on the whole body is named `body`. */
export function fieldErrorsFromZod(error: ZodError): FieldError[] {
  return error.issues.map((issue) => ({
    field: issue.path.length > 0 ? issue.path.map(String).join('.') : 'body',
    message: issue.message,
  }));
}

interface BodyParserError {
  type?: string;
  status?: number;
  expose?: boolean;
}

function isBodyParserError(error: unknown): error is BodyParserError {
  return typeof error === 'object' && error !== null && 'type' in error && typeof (error as BodyParserError).status === 'number';
}

/**
 * Maps any thrown value to RFC 9457 problem details. Only our own messages reach the client: ORM and
 * driver errors are reduced to a status and a plain sentence, and anything unknown becomes a generic 500.
 */
export function toProblem(error: unknown): Problem {
  if (error instanceof HttpError) {
    return problem(error.status, slugFor(error.status), error.title, error.detail, error.errors);
  }
  if (error instanceof ZodError) {
    return problem(400, 'validation', 'Some fields need attention', 'The request has invalid fields.', fieldErrorsFromZod(error));
  }
  if (error instanceof ValidationError) {
    return problem(400, 'validation', 'Some fields need attention', 'The request has invalid fields.');
  }
  if (error instanceof NotFoundError) {
    return problem(404, 'not-found', 'Not found', 'The record was not found.');
  }
  if (error instanceof UniqueViolationError) {
    const errors = (error.columns ?? []).map((column) => ({
      field: column.replace(/_([a-z])/g, (_m, c: string) => c.toUpperCase()),
      message: uniqueMessages[column] ?? 'This value is already in use',
    }));
    return problem(409, 'conflict', 'Already exists', errors[0]?.message ?? 'A record with these values already exists.', errors);
  }
  if (error instanceof ForeignKeyViolationError) {
    return problem(409, 'conflict', 'Conflicting reference', 'The record refers to, or is referred to by, another record.');
  }
  if (error instanceof CheckViolationError || error instanceof NotNullViolationError || error instanceof DataError) {
    return problem(400, 'validation', 'Invalid value', 'A value is out of range or has the wrong form.');
  }
  if (error instanceof ConstraintViolationError) {
    return problem(409, 'conflict', 'Conflict', 'The change conflicts with an existing record.');
  }
  if (isBodyParserError(error)) {
    if (error.type === 'entity.too.large') {
      return problem(413, 'too-large', 'Request too large', 'The request body is larger than the server accepts.');
    }
    if (error.type === 'entity.parse.failed') {
      return problem(400, 'malformed', 'Malformed request', 'The request body is not valid JSON.');
    }
    if (error.status && error.status >= 400 && error.status < 500) {
      return problem(error.status, slugFor(error.status), 'Bad request', 'The request could not be read.');
    }
  }
  return problem(500, 'internal', 'Something went wrong', 'The server could not complete the request. Please try again later.');
}
