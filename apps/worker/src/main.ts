/**
 * The Tunnelwright background worker: `node --import tsx apps/worker/src/main.ts`.
 * Reads REDIS_URL (default redis://127.0.0.1:63790), DATABASE_URL (default the local demo database) and
 * QUEUE_PREFIX (BullMQ key prefix shared with the API, default `bull`).
 */
import { defaultDatabaseUrl, queuePrefix } from '@tunnelwright/db';
import { logger } from './logger';
import { startReductionWorker } from './reductions/start-reduction-worker';
import { startWorker } from './start-worker';

const running = await startWorker({
  redisUrl: process.env.REDIS_URL ?? 'redis://127.0.0.1:63790',
  databaseUrl: process.env.DATABASE_URL ?? defaultDatabaseUrl,
  logger,
  prefix: queuePrefix(),
});
const reductions = await startReductionWorker({
  redisUrl: process.env.REDIS_URL ?? 'redis://127.0.0.1:63790',
  databaseUrl: process.env.DATABASE_URL ?? defaultDatabaseUrl,
  logger,
  prefix: queuePrefix(),
});

let stopping = false;
async function shutDown(signal: string): Promise<void> {
  if (stopping) return;
  stopping = true;
  logger.info({ signal }, 'stopping: letting running jobs finish');
  try {
    await Promise.all([running.close(), reductions.close()]);
    process.exit(0);
  } catch (error) {
    logger.error({ err: error }, 'error while stopping');
    process.exit(1);
  }
}

process.on('SIGTERM', () => void shutDown('SIGTERM'));
process.on('SIGINT', () => void shutDown('SIGINT'));
