import { CheckViolationError, ForeignKeyViolationError, NotFoundError, UniqueViolationError, ValidationError } from 'objection';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { HttpError } from './http-error';
import { toProblem } from './problem';

/** db-errors' typings only know the Error constructor; at run time they take these details. */
function dbError<T>(ErrorClass: new (message?: string) => T, details: object): T {
  return new (ErrorClass as unknown as new (details: object) => T)(details);
}

const nativeError = Object.assign(new Error('duplicate key value violates unique constraint "users_email_unique"'), { code: '23505' });

describe('toProblem', () => {
  it('keeps an HttpError as it is', () => {
    expect(toProblem(new HttpError(410, 'Link expired', 'This invitation has expired.'))).toMatchObject({ status: 410, title: 'Link expired', detail: 'This invitation has expired.' });
  });

  it('turns zod issues into dotted field errors', () => {
    const result = z.object({ lines: z.array(z.object({ amount: z.number({ message: 'Amount must be a number' }) })) }).safeParse({ lines: [{ amount: 1 }, { amount: 'x' }] });
    expect(result.success).toBe(false);
    const problem = toProblem(result.error);
    expect(problem.status).toBe(400);
    expect(problem.errors).toEqual([{ field: 'lines.1.amount', message: 'Amount must be a number' }]);
  });

  it('names a whole-body zod issue "body"', () => {
    const result = z.object({}).refine(() => false, { message: 'Nothing to change' }).safeParse({});
    expect(toProblem(result.error).errors).toEqual([{ field: 'body', message: 'Nothing to change' }]);
  });

  it('maps a unique violation to 409 on the camel-cased column, without the SQL message', () => {
    const error = dbError(UniqueViolationError, { nativeError, client: 'postgres', table: 'users', columns: ['email'], constraint: 'users_email_unique' });
    const problem = toProblem(error);
    expect(problem).toMatchObject({ status: 409, errors: [{ field: 'email', message: 'This e-mail address is already in use' }] });
    expect(JSON.stringify(problem)).not.toMatch(/duplicate key|constraint/);
  });

  it('maps a foreign-key violation to 409', () => {
    const error = dbError(ForeignKeyViolationError, { nativeError, client: 'postgres', table: 'services', constraint: 'services_tunnel_id_foreign' });
    expect(toProblem(error).status).toBe(409);
  });

  it('maps a check violation to 400', () => {
    const error = dbError(CheckViolationError, { nativeError, client: 'postgres', table: 'services', constraint: 'services_rate_not_negative' });
    expect(toProblem(error).status).toBe(400);
  });

  it('maps objection validation to 400 and not-found to 404', () => {
    expect(toProblem(new ValidationError({ type: 'ModelValidation', message: 'bad' })).status).toBe(400);
    expect(toProblem(new NotFoundError({})).status).toBe(404);
  });

  it('maps body-parser errors: too large → 413, bad JSON → 400', () => {
    expect(toProblem({ type: 'entity.too.large', status: 413 }).status).toBe(413);
    expect(toProblem({ type: 'entity.parse.failed', status: 400 })).toMatchObject({ status: 400, detail: 'The request body is not valid JSON.' });
  });

  it('hides anything unknown behind a generic 500', () => {
    const problem = toProblem(new Error('relation "secrets" does not exist at Parser.parse (pg/lib/parser.js:1:1)'));
    expect(problem).toMatchObject({ status: 500, title: 'Something went wrong' });
    expect(JSON.stringify(problem)).not.toMatch(/relation|secrets|parser/);
  });
});
