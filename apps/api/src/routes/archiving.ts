import type { Knex } from 'knex';
import { recordAudit, Service, Tunnel } from '@tunnelwright/db';
import { HttpError } from '../errors/http-error';

type Archivable = typeof Tunnel | typeof Service;

/**
 * Archives or restores a catalogue record with its audit row in one transaction. Asking for the state
 * the record is already in changes nothing and writes no audit row.
 */
export async function setArchived<M extends Archivable, D>(
  knex: Knex,
  model: M,
  what: { entity: string; label: string; present: (record: InstanceType<M>) => D },
  id: string,
  archived: boolean,
  actorId: string,
): Promise<D> {
  return knex.transaction(async (trx) => {
    const record = (await model.query(trx).findById(id).forUpdate()) as InstanceType<M> | undefined;
    if (!record) throw HttpError.notFound(what.label);
    if ((record.archivedAt !== null) === archived) return what.present(record);
    const updated = (await model.query(trx).patchAndFetchById(id, { archivedAt: archived ? new Date() : null })) as InstanceType<M>;
    await recordAudit(trx, {
      actorId,
      action: `${what.entity}.${archived ? 'archived' : 'restored'}`,
      entity: what.entity,
      entityId: id,
      before: what.present(record),
      after: what.present(updated),
    });
    return what.present(updated);
  });
}
