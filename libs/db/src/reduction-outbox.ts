import type { Queue } from 'bullmq';
import type { Knex } from 'knex';
import { dispatchOutbox } from './outbox';
import { queuePrefix, reductionOutboxQueue, reductionQueue } from './reduction-jobs';

/** What a dispatcher says about its work; a pino logger fits. */
export interface DispatchLogger {
  info(details: object, message: string): void;
  error(details: object, message: string): void;
}

/**
 * Sends the undispatched reduction outbox messages of `prefix` (or only those listed in `ids`) to the
 * reductions queue. The job id is the reduction id, so BullMQ keeps one job however often a message is
 * sent: by the API after its commit, by the API or the worker at start-up, or by their periodic loops.
 *
 * @returns how many messages were dispatched
 */
export function dispatchReductionOutbox(knex: Knex, queue: Queue, options: { prefix?: string; ids?: string[] } = {}): Promise<number> {
  return dispatchOutbox(
    knex,
    reductionOutboxQueue(options.prefix ?? queuePrefix()),
    async (message) => {
      await queue.add(message.jobName, message.payload, { ...reductionQueue.jobOptions, jobId: message.jobId });
    },
    { ids: options.ids },
  );
}

/** A started dispatcher loop; `stop` ends it and waits for a round in progress. */
export interface RunningOutboxDispatcher {
  stop(): Promise<void>;
}

/**
 * Dispatches the reduction outbox once now (so a message whose process died between commit and enqueue
 * is sent when the next API or worker starts), then every `everyMs`. A round never overlaps the previous
 * one; a failed round is logged and the next one tries again.
 *
 * @param failOnStart whether a failure of the first round is thrown (the worker cannot work without its
 *   queue) or only logged, so the process starts anyway and a later round sends the messages
 */
export async function startReductionOutboxDispatcher(
  knex: Knex,
  queue: Queue,
  options: { prefix?: string; everyMs: number; logger: DispatchLogger; failOnStart?: boolean },
): Promise<RunningOutboxDispatcher> {
  const { logger } = options;
  let round: Promise<void> | undefined;
  const dispatch = async () => {
    const sent = await dispatchReductionOutbox(knex, queue, { prefix: options.prefix });
    if (sent > 0) logger.info({ sent }, 'outbox messages dispatched');
  };
  const logged = () => dispatch().catch((error: unknown) => logger.error({ err: error }, 'outbox dispatch failed'));

  if (options.failOnStart) await dispatch();
  else await logged();
  const timer = setInterval(() => {
    if (round) return;
    round = logged().finally(() => {
      round = undefined;
    });
  }, options.everyMs);
  // The loop alone never keeps a process alive.
  timer.unref();
  return {
    async stop() {
      clearInterval(timer);
      await round;
    },
  };
}
