import { Run } from '@tunnelwright/db';
import { HttpError } from '../errors/http-error';

/** Run kinds whose files are reduced to coefficients; zero and tare runs are stored only. */
export const reducedRunKinds = new Set(['data', 'sphere_calibration']);

/** A run with its test, the test's article, tunnel and balance; 404 if there is none. */
export async function loadRunForReduction(runId: string): Promise<Run & { test: NonNullable<Run['test']> }> {
  const run = await Run.query().findById(runId).withGraphFetched('test.[article, tunnel, balance]');
  if (!run || !run.test) throw HttpError.notFound('The run');
  return run as Run & { test: NonNullable<Run['test']> };
}
