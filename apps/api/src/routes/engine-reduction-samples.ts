import type { ReductionResult } from '@tunnelwright/aero';
import { Reduction, ReductionPoint } from '@tunnelwright/db';

/**
 * Stores a finished reduction of the real engine as the worker stores one: the reduction with its configuration
 * and summary, and each point's key columns beside the whole per-point result. For the route samples and tests.
 */
export async function storeEngineReduction(source: { runId: string; rawFileId: string; inputSha256: string; createdBy: string }, result: ReductionResult): Promise<Reduction> {
  const { points, config, ...summary } = result;
  const reduction = await Reduction.query().insert({
    runId: source.runId,
    rawFileId: source.rawFileId,
    version: 1,
    engineVersion: result.engineVersion,
    config: config as unknown as Record<string, unknown>,
    calibrationId: null,
    overrideId: null,
    state: 'done',
    progress: 1,
    inputSha256: source.inputSha256,
    warnings: result.warnings,
    summary: summary as unknown as Record<string, unknown>,
    createdBy: source.createdBy,
    startedAt: new Date(),
    finishedAt: new Date(),
  });
  await ReductionPoint.query().insert(
    points.map((p, index) => ({
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
    })),
  );
  return reduction;
}
