/**
 * Sandboxed processor of the reductions queue (runs in a worker thread, so the CPU-heavy reduction never
 * blocks the worker's lock renewals). Thin: it hands the reduction id to `runReduction`.
 */
import { createKnex, createRawStore } from '@tunnelwright/db';
import { UnrecoverableError, type SandboxedJob } from 'bullmq';
import { runReduction } from './run-reduction';

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
