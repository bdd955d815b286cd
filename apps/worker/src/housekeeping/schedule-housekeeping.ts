import type { Queue } from 'bullmq';
import { expireLapsedHoldsEveryMs, housekeepingJobs, purgeExpiredTokensEveryMs } from '../queues';

/**
 * Registers the repeatable housekeeping jobs. Upserting by a fixed scheduler id keeps exactly one schedule
 * however many worker replicas start.
 */
export async function scheduleHousekeeping(queue: Queue, everyMs: number = purgeExpiredTokensEveryMs): Promise<void> {
  await queue.upsertJobScheduler(
    housekeepingJobs.purgeExpiredTokens,
    { every: everyMs },
    {
      name: housekeepingJobs.purgeExpiredTokens,
      data: {},
      opts: { attempts: 3, backoff: { type: 'exponential', delay: 10_000 }, removeOnComplete: 100, removeOnFail: 500 },
    },
  );
  await queue.upsertJobScheduler(
    housekeepingJobs.expireLapsedHolds,
    { every: expireLapsedHoldsEveryMs },
    {
      name: housekeepingJobs.expireLapsedHolds,
      data: {},
      opts: { attempts: 3, backoff: { type: 'exponential', delay: 10_000 }, removeOnComplete: 100, removeOnFail: 500 },
    },
  );
}
