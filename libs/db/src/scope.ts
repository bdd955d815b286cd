import { staffRoles, type Role } from '@tunnelwright/contracts';
import type { QueryBuilder, Model } from 'objection';

/** What the scoping helpers need to know about the caller. */
export interface Caller {
  id: string;
  role: Role;
  organisationId: string;
}

/** Whether the caller works for the lab (technician, analyst or lab manager). */
export function isStaff(caller: Pick<Caller, 'role'>): boolean {
  return staffRoles.includes(caller.role);
}

/**
 * Limits a query to what the caller may see: staff see every record the lab holds; a customer sees only
 * the rows of their own organisation. `column` names the organisation column of the queried table.
 */
export function scopeToCaller<M extends Model, R>(
  query: QueryBuilder<M, R>,
  caller: Caller,
  column = 'organisationId',
): QueryBuilder<M, R> {
  if (isStaff(caller)) return query;
  const table = query.modelClass().tableName;
  return query.where(`${table}.${column}`, caller.organisationId);
}
