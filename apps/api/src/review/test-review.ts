import { DESIGN_CAUTION } from '@tunnelwright/aero';
import type { ReviewExclusion, ReviewRun, TestReview } from '@tunnelwright/contracts';
import { PointExclusion, Reduction, ReductionPoint, Run, TestRecord, User } from '@tunnelwright/db';
import { HttpError } from '../errors/http-error';
import { splitWarnings, toReviewPoint } from './review-point';
import { sphereCalibration } from './sphere-calibration';

/** Exclusions of one reduction by point index, with who made them. */
async function exclusionsOf(reductionId: string): Promise<Map<number, ReviewExclusion>> {
  const rows = await PointExclusion.query().where('reductionId', reductionId);
  const people = rows.length === 0 ? [] : await User.query().findByIds([...new Set(rows.map((r) => r.excludedBy))]).select('id', 'name');
  const names = new Map(people.map((p) => [p.id, p.name]));
  return new Map(
    rows.map((r) => [r.pointIndex, { reason: r.reason, excludedBy: { id: r.excludedBy, name: names.get(r.excludedBy) ?? '' }, createdAt: new Date(r.createdAt).toISOString() }]),
  );
}

/** The chosen version of one run with its points, warnings, exclusions and, for a sphere calibration, the reference curves. */
async function selectedVersion(run: Run, reduction: Reduction): Promise<NonNullable<ReviewRun['selected']>> {
  const [points, exclusions] = await Promise.all([ReductionPoint.query().where('reductionId', reduction.id).orderBy('index'), exclusionsOf(reduction.id)]);
  const warnings = splitWarnings(reduction.warnings ?? []);
  const reviewed = points.map((p) => toReviewPoint(p, warnings.byPoint.get(p.pointNumber) ?? [], exclusions.get(p.index) ?? null));
  return {
    reductionId: reduction.id,
    version: reduction.version,
    frozen: reduction.approvedAt !== null,
    points: reviewed,
    warnings: warnings.run,
    sphere: run.kind === 'sphere_calibration' ? sphereCalibration(reviewed) : null,
  };
}

/**
 * The review of one test: every run with its finished reduction versions, newest first, and the chosen (by default
 * the newest finished) version in full.
 *
 * @param testId - the test
 * @param chosenReductionIds - versions to show instead of the newest, at most one per run
 * @throws HttpError 404 for an unknown test; 400 on `reductionIds` for a version that is not a finished reduction
 *   of this test, or two versions of one run
 */
export async function loadTestReview(testId: string, chosenReductionIds: readonly string[]): Promise<TestReview> {
  const test = await TestRecord.query().findById(testId);
  if (!test) throw HttpError.notFound('The test');
  const runs = await Run.query().where('testId', test.id).orderBy('runNumber');
  const done = runs.length === 0 ? [] : await Reduction.query().whereIn('runId', runs.map((r) => r.id)).where('state', 'done').orderBy('version', 'desc');
  const counts = new Map<string, number>();
  if (done.length > 0) {
    const rows = (await ReductionPoint.query().whereIn('reductionId', done.map((r) => r.id)).groupBy('reductionId').select('reductionId').count('* as count')) as unknown as { reductionId: string; count: string }[];
    for (const row of rows) counts.set(row.reductionId, Number(row.count));
  }

  const chosenByRun = new Map<string, Reduction>();
  for (const id of chosenReductionIds) {
    const reduction = done.find((r) => r.id === id);
    if (!reduction) throw HttpError.field('reductionIds', `Reduction ${id} is not a finished reduction of this test`);
    if (chosenByRun.has(reduction.runId)) throw HttpError.field('reductionIds', 'Choose at most one version per run');
    chosenByRun.set(reduction.runId, reduction);
  }

  const reviewed: ReviewRun[] = [];
  for (const run of runs) {
    const versions = done.filter((r) => r.runId === run.id);
    const shown = chosenByRun.get(run.id) ?? versions[0];
    reviewed.push({
      id: run.id,
      runNumber: run.runNumber,
      kind: run.kind,
      configurationLabel: run.configurationLabel,
      versions: versions.map((r) => ({
        id: r.id,
        version: r.version,
        engineVersion: r.engineVersion,
        pointCount: counts.get(r.id) ?? 0,
        finishedAt: r.finishedAt ? new Date(r.finishedAt).toISOString() : null,
        frozen: r.approvedAt !== null,
      })),
      selected: shown ? await selectedVersion(run, shown) : null,
    });
  }
  return { test: { id: test.id, title: test.title, state: test.state }, runs: reviewed, caution: DESIGN_CAUTION };
}
