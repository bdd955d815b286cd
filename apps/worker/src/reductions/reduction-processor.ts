/**
 * Sandboxed processor of the reductions queue (runs in a worker thread, so the CPU-heavy reduction never
 * blocks the worker's lock renewals, and a crash or hang in parsing never takes the worker down). Thin: it
 * hands the reduction id to `runReduction`. The worker bundles this file into one JavaScript module
 * (`buildReductionProcessor`), so everything it imports is loaded into the thread: keep imports few.
 */
import { createKnex, createRawStore } from '@tunnelwright/db';
import type { SandboxedJob } from 'bullmq';
import { runReduction } from './run-reduction';

/**
 * Tells BullMQ not to retry. A sandboxed job's error crosses to the worker as plain data, where BullMQ
 * recognises it by its name alone; so this needs no import of BullMQ's whole package into the thread.
 */
class UnrecoverableError extends Error {
  override name = 'UnrecoverableError';
}

const knex = createKnex(process.env.DATABASE_URL);
const store = createRawStore();

export default async function reductionProcessor(job: SandboxedJob<{ reductionId?: unknown }>): Promise<{ points: number } | { skipped: string }> {
  const reductionId = job.data.reductionId;
  if (typeof reductionId !== 'string') throw new UnrecoverableError('a reduction job needs { reductionId }');
  const outcome = await runReduction(knex, store, reductionId, (fraction) => job.updateProgress(fraction));
  if (outcome.kind === 'failed') throw new UnrecoverableError(`${outcome.failure.code}: ${outcome.failure.message}`);
  if (outcome.kind === 'skipped') return { skipped: outcome.state };
  return { points: outcome.points };
}
