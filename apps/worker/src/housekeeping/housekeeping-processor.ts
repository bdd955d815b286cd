import { expireLapsedHolds } from '@tunnelwright/db';
import { UnrecoverableError, type Job } from 'bullmq';
import type { Knex } from 'knex';
import type { Logger } from 'pino';
import { housekeepingJobs } from '../queues';
import { purgeExpiredTokens, type PurgeCounts } from './purge-expired-tokens';

/**
 * Builds the processor of the housekeeping queue: it only dispatches on the job name to a function that
 * does the work. An unknown job name is bad input that no retry can fix.
 */
export function createHousekeepingProcessor(knex: Knex, logger: Logger): (job: Job) => Promise<PurgeCounts | { expired: number }> {
  return async (job) => {
    if (job.name === housekeepingJobs.purgeExpiredTokens) {
      const counts = await purgeExpiredTokens(knex);
      logger.info({ jobId: job.id, ...counts }, 'purged expired tokens');
      return counts;
    }
    if (job.name === housekeepingJobs.expireLapsedHolds) {
      const expired = await expireLapsedHolds(knex);
      if (expired.length > 0) logger.info({ jobId: job.id, bookings: expired }, 'expired lapsed booking holds');
      return { expired: expired.length };
    }
    throw new UnrecoverableError(`housekeeping has no job named "${job.name}"`);
  };
}
