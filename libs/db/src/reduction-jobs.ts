/**
 * The reductions queue as both the API (which enqueues through the outbox) and the worker see it.
 * A job's payload is `{ reductionId }` and its job id is the reduction id, so a re-sent job collapses.
 */
export const reductionQueue = {
  name: 'reductions',
  jobName: 'reduce-run',
  /** Transient failures (database, store, crash) are retried with exponential backoff. */
  jobOptions: { attempts: 5, backoff: { type: 'exponential', delay: 2000 }, removeOnComplete: 1000, removeOnFail: 5000 },
} as const;

/** BullMQ key prefix shared by API and worker: `QUEUE_PREFIX`, default `bull`. */
export function queuePrefix(env: NodeJS.ProcessEnv = process.env): string {
  return env.QUEUE_PREFIX ?? 'bull';
}

/**
 * The outbox `queue` value of reduction jobs under a BullMQ prefix. Dispatchers only send the messages of
 * their own prefix, so separate deployments (or test runs) sharing a database never take each other's jobs.
 */
export function reductionOutboxQueue(prefix: string = queuePrefix()): string {
  return `${prefix}:${reductionQueue.name}`;
}
