import type { Knex } from 'knex';
import { OutboxMessage } from './models/outbox-message';

/** Sends one outbox message to its queue; must be harmless to repeat (the queue collapses equal job ids). */
export type OutboxSender = (message: OutboxMessage) => Promise<void>;

/**
 * Sends every undispatched outbox message of `queue` (or only those listed in `ids`), oldest first, and marks each
 * dispatched once its queue accepted it. Rows are locked with SKIP LOCKED, so several dispatchers
 * (API and worker replicas) never send the same row at the same moment; a crash after sending but before
 * marking only means the message is sent again, which its job id makes harmless.
 *
 * @returns how many messages were dispatched
 */
export async function dispatchOutbox(knex: Knex, queue: string, send: OutboxSender, options: { ids?: string[]; batchSize?: number } = {}): Promise<number> {
  let dispatched = 0;
  const batchSize = options.batchSize ?? 100;
  for (;;) {
    const sent = await knex.transaction(async (trx) => {
      const query = OutboxMessage.query(trx).where('queue', queue).whereNull('dispatchedAt').orderBy('createdAt').limit(batchSize).forUpdate().skipLocked();
      if (options.ids) query.whereIn('id', options.ids);
      const messages = await query;
      for (const message of messages) {
        await send(message);
        await OutboxMessage.query(trx).patch({ dispatchedAt: new Date() }).where('id', message.id);
      }
      return messages.length;
    });
    dispatched += sent;
    if (sent < batchSize || options.ids) return dispatched;
  }
}
