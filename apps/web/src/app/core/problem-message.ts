import { HttpErrorResponse } from '@angular/common/http';
import type { FieldError, Problem } from '@tunnelwright/contracts';

function problemOf(error: unknown): Partial<Problem> | null {
  if (error instanceof HttpErrorResponse && error.error && typeof error.error === 'object') {
    return error.error as Partial<Problem>;
  }
  return null;
}

/** A sentence to show for a failed call: the API's problem detail when it sent one. */
export function problemMessage(error: unknown, fallback = 'Something went wrong. Please try again.'): string {
  if (error instanceof HttpErrorResponse && error.status === 0) {
    return 'The server could not be reached. Check your connection and try again.';
  }
  const problem = problemOf(error);
  return problem?.detail || problem?.title || fallback;
}

/** The field-level errors of a validation problem, if any. */
export function problemFieldErrors(error: unknown): readonly FieldError[] {
  return problemOf(error)?.errors ?? [];
}

/** The HTTP status of a failed call, or 0 when it never reached the server. */
export function problemStatus(error: unknown): number {
  return error instanceof HttpErrorResponse ? error.status : 0;
}
