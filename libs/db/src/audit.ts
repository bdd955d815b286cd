import type { Knex } from 'knex';
import { AuditEntry } from './models/audit-entry';

/** One change of consequence, as recorded in the audit trail. */
export interface AuditRecord {
  actorId: string | null;
  action: string;
  entity: string;
  entityId: string | null;
  before?: unknown;
  after?: unknown;
}

/** Writes an audit row inside `trx`, so it commits or rolls back together with the change it describes. */
export async function recordAudit(trx: Knex.Transaction, record: AuditRecord): Promise<AuditEntry> {
  return AuditEntry.query(trx).insert({
    actorId: record.actorId,
    action: record.action,
    entity: record.entity,
    entityId: record.entityId,
    before: record.before ?? null,
    after: record.after ?? null,
  });
}
