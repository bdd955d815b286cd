import type { Knex } from 'knex';
import { recordAudit } from '@tunnelwright/db';
import type { Model, ModelClass, PartialModelObject } from 'objection';
import { HttpError } from '../errors/http-error';

/** A catalogue model that can be archived. */
type Archivable = Model & { id: string; archivedAt: Date | null };

/**
 * Archives or restores a catalogue record with its audit row in one transaction. Asking for the state
 * the record is already in changes nothing and writes no audit row.
 */
export async function setArchived<M extends Archivable, D>(
  knex: Knex,
  model: ModelClass<M>,
  what: { entity: string; label: string; present: (record: M) => D },
  id: string,
  archived: boolean,
  actorId: string,
): Promise<D> {
  return knex.transaction(async (trx) => {
    // Objection's query types do not follow a generic model class; the casts restore what the call returns.
    const record = (await model.query(trx).findById(id).forUpdate()) as unknown as M | undefined;
    if (!record) throw HttpError.notFound(what.label);
    if ((record.archivedAt !== null) === archived) return what.present(record);
    const patch = { archivedAt: archived ? new Date() : null } as unknown as PartialModelObject<M>;
    const updated = (await model.query(trx).patchAndFetchById(id, patch)) as unknown as M;
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
