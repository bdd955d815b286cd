/**
 * The failed call behind a resource's error. A resource wraps a thrown value that is not an `Error` (as an
 * `HttpErrorResponse` is not) in an error of its own, keeping the original as `cause`.
 */
export function resourceCause(error: unknown): unknown {
  if (error instanceof Error && error.cause !== undefined) return error.cause;
  return error;
}
