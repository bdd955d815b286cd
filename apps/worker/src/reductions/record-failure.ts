import { Reduction } from '@tunnelwright/db';
import type { Knex } from 'knex';

/** Why a reduction can never succeed, whatever the number of retries: bad file, bad configuration, lost bytes. */
export interface ReductionFailure {
  code: string;
  message: string;
  line: number | null;
  column: number | null;
  issues?: unknown[];
}

/**
 * Records a failure that no retry can fix. Kept apart from the engine so the worker's main thread, which
 * only records failures of used-up retries, never loads the reduction engine.
 */
export async function recordFailure(knex: Knex, reductionId: string, failure: ReductionFailure): Promise<void> {
  await Reduction.query(knex)
    .patch({
      state: 'failed',
      errorCode: failure.code,
      errorMessage: failure.message.slice(0, 4000),
      errorLine: failure.line,
      errorColumn: failure.column,
      summary: failure.issues ? { issues: failure.issues } : null,
      finishedAt: new Date(),
    })
    .where('id', reductionId)
    .whereNot('state', 'done');
}
