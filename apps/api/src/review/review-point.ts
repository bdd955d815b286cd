import type { CoefficientValue } from '@tunnelwright/aero';
import type { ReviewExclusion, ReviewPoint, ReviewWarning } from '@tunnelwright/contracts';
import type { ReductionPoint } from '@tunnelwright/db';

/** The parts of the engine's stored per-point result the review reads (see `PointResult` in libs/aero). */
interface StoredCorrected {
  dragCoefficient?: CoefficientValue;
  liftCoefficient?: CoefficientValue;
  sideForceCoefficient?: CoefficientValue;
}

function finiteOrNull(value: unknown): number | null {
  return typeof value === 'number' && Number.isFinite(value) ? value : null;
}

/**
 * A corrected coefficient with its expanded uncertainty U (k = 2) from the stored engine result, falling back on
 * the key column (with no U) for a point stored without a full result.
 */
function withUncertainty(stored: CoefficientValue | undefined, column: number | null): ReviewPoint['dragCoefficient'] {
  const value = finiteOrNull(stored?.value) ?? column;
  if (value === null) return null;
  return { value, expandedUncertainty: finiteOrNull(stored?.uncertainty?.expandedUncertainty) };
}

/**
 * One stored point as the review shows it: corrected C_D, C_L, C_Y each with U (k = 2), its warnings and, when the
 * analyst left it out, the exclusion with its reason.
 *
 * @param point - the stored point row
 * @param warnings - the reduction's warnings about this point
 * @param exclusion - the point's exclusion, if any
 */
export function toReviewPoint(point: ReductionPoint, warnings: ReviewWarning[], exclusion: ReviewExclusion | null): ReviewPoint {
  const corrected = ((point.result ?? {}) as { corrected?: StoredCorrected }).corrected ?? {};
  return {
    index: point.index,
    pointNumber: point.pointNumber,
    yaw: point.yaw,
    pitch: point.pitch,
    speed: point.speed,
    reynoldsNumber: point.reynoldsNumber,
    dragCoefficient: withUncertainty(corrected.dragCoefficient, point.cdCorrected),
    liftCoefficient: withUncertainty(corrected.liftCoefficient, point.clCorrected),
    sideForceCoefficient: withUncertainty(corrected.sideForceCoefficient, point.csCorrected),
    dragCounts: point.dragCounts,
    warnings,
    exclusion,
  };
}

/** Splits a reduction's stored warnings into those about one point (by point number) and those about the whole run. */
export function splitWarnings(stored: unknown[]): { byPoint: Map<number, ReviewWarning[]>; run: ReviewWarning[] } {
  const byPoint = new Map<number, ReviewWarning[]>();
  const run: ReviewWarning[] = [];
  for (const entry of stored) {
    if (!entry || typeof entry !== 'object') continue;
    const { code, message, point } = entry as { code?: unknown; message?: unknown; point?: unknown };
    const warning = { code: String(code ?? 'WARNING'), message: String(message ?? '') };
    if (typeof point === 'number') byPoint.set(point, [...(byPoint.get(point) ?? []), warning]);
    else run.push(warning);
  }
  return { byPoint, run };
}
