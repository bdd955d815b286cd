import { parseReductionConfig, reduceRun } from '@tunnelwright/aero';
import { RawFile, Reduction, ReductionPoint, Run } from '@tunnelwright/db';
import { sampleRunFile, sampleRunId } from './ingest-samples';
import type { SampleFixtures } from './route';

/** An invented closed section and 1:4 model, enough for the engine to reduce the sample run file. */
const sampleConfig = {
  tunnel: { kind: 'closed', sectionArea: 2.9 },
  article: { referenceArea: 0.14, referenceAreaKind: 'frontal', referenceLength: 0.7, scale: 4 },
  minimumSamplesPerPoint: 2,
};

/**
 * A reduction of the sample run file by the real engine, stored as the worker stores one (key columns and the
 * whole per-point result), so the review routes of the role matrix read genuine engine output.
 */
export async function sampleEngineReductionId(f: SampleFixtures): Promise<string> {
  const runId = await sampleRunId(f);
  const run = await Run.query().findById(runId);
  const rawFile = await RawFile.query().findOne({ runId });
  if (!run || !rawFile) throw new Error('sample run missing');
  const config = parseReductionConfig(sampleConfig, 'sample configuration');
  const result = await reduceRun([Buffer.from(sampleRunFile)], config, { fileName: rawFile.originalName });
  const { points, config: _config, ...summary } = result;
  const reduction = await Reduction.query().insert({
    runId,
    rawFileId: rawFile.id,
    version: 1,
    engineVersion: result.engineVersion,
    config: config as unknown as Record<string, unknown>,
    calibrationId: null,
    overrideId: null,
    state: 'done',
    progress: 1,
    inputSha256: rawFile.sha256,
    warnings: result.warnings,
    summary: summary as unknown as Record<string, unknown>,
    createdBy: run.createdBy,
    startedAt: new Date(),
    finishedAt: new Date(),
  });
  for (const [index, p] of points.entries()) {
    await ReductionPoint.query().insert({
      reductionId: reduction.id,
      index,
      pointNumber: p.point,
      sampleCount: p.sampleCount,
      yaw: p.yaw,
      pitch: p.pitch,
      dynamicPressure: p.correctedDynamicPressure,
      speed: p.correctedSpeed,
      reynoldsNumber: p.reynoldsNumber,
      cdUncorrected: p.uncorrected.dragCoefficient.value,
      cdCorrected: p.corrected.dragCoefficient.value,
      clCorrected: p.corrected.liftCoefficient.value,
      csCorrected: p.corrected.sideForceCoefficient.value,
      dragCounts: p.dragCounts,
      setpoints: { yaw: p.yaw, pitch: p.pitch },
      result: p as unknown as Record<string, unknown>,
    });
  }
  return reduction.id;
}

/** The test of a sample engine reduction. */
export async function sampleReviewTestId(f: SampleFixtures): Promise<string> {
  const reduction = await Reduction.query().findById(await sampleEngineReductionId(f));
  const run = reduction && (await Run.query().findById(reduction.runId));
  if (!run) throw new Error('sample reduction missing');
  return run.testId;
}
