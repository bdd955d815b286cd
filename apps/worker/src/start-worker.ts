import { createKnex } from '@tunnelwright/db';
import { Queue, Worker } from 'bullmq';
import { Redis } from 'ioredis';
import type { Logger } from 'pino';
import { createHousekeepingProcessor } from './housekeeping/housekeeping-processor';
import { scheduleHousekeeping } from './housekeeping/schedule-housekeeping';
import { queueNames } from './queues';

/** What the worker process needs to run. */
export interface WorkerOptions {
  redisUrl: string;
  databaseUrl: string;
  logger: Logger;
  /** BullMQ key prefix shared with the API (default `bull`); tests use their own so they never meet another run's jobs. */
  prefix?: string;
  /** Interval of the token purge, in milliseconds (default hourly). */
  purgeEveryMs?: number;
}

/** A started worker; `close` lets running jobs finish, then releases Redis and the database. */
export interface RunningWorker {
  readonly housekeepingQueue: Queue;
  readonly housekeepingWorker: Worker;
  close(): Promise<void>;
}

/** Connects to Redis and PostgreSQL, registers the repeatable jobs and starts consuming the queues. */
export async function startWorker(options: WorkerOptions): Promise<RunningWorker> {
  const { logger } = options;
  // BullMQ's blocking commands need a connection that never gives up on a request.
  const connection = new Redis(options.redisUrl, { maxRetriesPerRequest: null });
  const knex = createKnex(options.databaseUrl);
  const prefix = options.prefix ?? 'bull';

  const housekeepingQueue = new Queue(queueNames.housekeeping, { connection, prefix });
  await scheduleHousekeeping(housekeepingQueue, options.purgeEveryMs);

  const housekeepingWorker = new Worker(queueNames.housekeeping, createHousekeepingProcessor(knex, logger), {
    connection,
    prefix,
    concurrency: 1,
  });
  housekeepingWorker.on('failed', (job, error) => {
    logger.error({ queue: queueNames.housekeeping, jobId: job?.id, jobName: job?.name, err: error }, 'job failed');
  });
  housekeepingWorker.on('error', (error) => {
    logger.error({ queue: queueNames.housekeeping, err: error }, 'worker error');
  });
  logger.info({ queues: [queueNames.housekeeping], prefix }, 'worker started');

  return {
    housekeepingQueue,
    housekeepingWorker,
    async close() {
      await housekeepingWorker.close();
      await housekeepingQueue.close();
      await knex.destroy();
      await connection.quit();
      logger.info('worker stopped');
    },
  };
}
