import { createKnex, queuePrefix, reductionQueue, startReductionOutboxDispatcher } from '@tunnelwright/db';
import { Queue, Worker } from 'bullmq';
import { Redis } from 'ioredis';
import type { Logger } from 'pino';
import { buildReductionProcessor } from './build-reduction-processor';
import { recordFailure } from './record-failure';

/** What the reductions worker needs. */
export interface ReductionWorkerOptions {
  redisUrl: string;
  databaseUrl: string;
  logger: Logger;
  /** BullMQ key prefix (default `QUEUE_PREFIX` or `bull`), shared with the API. */
  prefix?: string;
  /** Reductions run at once (default `REDUCTION_CONCURRENCY` or 1: the machine has few cores). */
  concurrency?: number;
  /** How often undispatched outbox messages are re-sent, ms (default 5 s). */
  dispatchEveryMs?: number;
  /** Job lock duration, ms (default `REDUCTION_LOCK_MS` or 30 s); a job whose worker died is retried after it. */
  lockDurationMs?: number;
}

/** A started reductions worker; `close` lets the running reduction finish, then releases its connections. */
export interface RunningReductionWorker {
  readonly queue: Queue;
  readonly worker: Worker;
  close(): Promise<void>;
}

/**
 * Young generation of the sandbox thread, MB. Parsing makes many short-lived strings; left alone V8 grows
 * the young generation to tens of MB for them, which costs resident memory and buys almost no speed.
 */
const sandboxYoungGenerationMb = 8;

/**
 * Starts consuming the reductions queue with the sandboxed processor, and the outbox dispatcher: once at
 * start-up (so a crash between an upload's commit and its enqueue loses nothing) and then periodically.
 */
export async function startReductionWorker(options: ReductionWorkerOptions): Promise<RunningReductionWorker> {
  const { logger } = options;
  const prefix = options.prefix ?? queuePrefix();
  const connection = new Redis(options.redisUrl, { maxRetriesPerRequest: null });
  const knex = createKnex(options.databaseUrl);
  const queue = new Queue(reductionQueue.name, { connection, prefix });
  const lockDuration = options.lockDurationMs ?? Number(process.env.REDUCTION_LOCK_MS ?? 30_000);

  const dispatcher = await startReductionOutboxDispatcher(knex, queue, { prefix, everyMs: options.dispatchEveryMs ?? 5000, logger, failOnStart: true });

  const processorFile = await buildReductionProcessor();
  const worker = new Worker(reductionQueue.name, processorFile, {
    connection,
    prefix,
    concurrency: options.concurrency ?? Number(process.env.REDUCTION_CONCURRENCY ?? 1),
    useWorkerThreads: true,
    workerThreadsOptions: {
      // The processor is plain JavaScript: the thread needs none of the parent's loaders (`--import tsx`).
      execArgv: [],
      resourceLimits: { maxYoungGenerationSizeMb: sandboxYoungGenerationMb },
    },
    lockDuration,
    stalledInterval: Math.max(1000, Math.floor(lockDuration / 2)),
  });
  worker.on('failed', (job, error) => {
    logger.error({ queue: reductionQueue.name, jobId: job?.id, attempts: job?.attemptsMade, err: error }, 'reduction job failed');
    const reductionId = (job?.data as { reductionId?: unknown } | undefined)?.reductionId;
    const finalAttempt = job && (error.name === 'UnrecoverableError' || job.attemptsMade >= (job.opts.attempts ?? 1));
    if (finalAttempt && typeof reductionId === 'string' && error.name !== 'UnrecoverableError') {
      // Retries are used up: say so on the reduction rather than leave it running for ever.
      recordFailure(knex, reductionId, { code: 'REDUCTION_FAILED', message: `the reduction failed ${job.attemptsMade} times: ${error.message}`, line: null, column: null }).catch((e: unknown) =>
        logger.error({ err: e }, 'could not record the failure'),
      );
    }
  });
  worker.on('error', (error) => logger.error({ queue: reductionQueue.name, err: error }, 'worker error'));
  logger.info({ queue: reductionQueue.name, prefix }, 'reductions worker started');

  return {
    queue,
    worker,
    async close() {
      await dispatcher.stop();
      await worker.close();
      await queue.close();
      await knex.destroy();
      await connection.quit();
    },
  };
}
