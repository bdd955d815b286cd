import { provisionalStates } from '@tunnelwright/contracts';
import type { Knex } from 'knex';
import { recordAudit } from './audit';

/**
 * Expires every provisional hold (requested, quoted, counter_proposed) whose `holdExpiresAt` has passed,
 * freeing its slot, with one audit row per booking in the same transaction. Only `tunnelId`'s bookings
 * when given. Safe to repeat and to run from several processes: a booking expires once.
 *
 * The worker calls it on a schedule; a new request calls it for its tunnel inside its own transaction, so
 * a lapsed hold never blocks a new booking even between sweeps.
 *
 * @returns the ids of the bookings that expired
 */
export async function expireLapsedHolds(knex: Knex, options: { tunnelId?: string; now?: Date } = {}): Promise<string[]> {
  const run = async (trx: Knex.Transaction): Promise<string[]> => {
    const query = trx('bookings')
      .whereIn('state', provisionalStates as string[])
      .where('hold_expires_at', '<=', options.now ?? new Date())
      .update({ state: 'expired', updated_at: trx.fn.now() })
      .returning(['id', 'state']);
    if (options.tunnelId) query.where('tunnel_id', options.tunnelId);
    const rows = (await query) as { id: string }[];
    for (const row of rows) {
      await recordAudit(trx, { actorId: null, action: 'booking.expired', entity: 'booking', entityId: row.id, after: { state: 'expired' } });
    }
    return rows.map((r) => r.id);
  };
  return knex.isTransaction ? run(knex as Knex.Transaction) : knex.transaction(run);
}
