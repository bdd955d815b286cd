import { criticalReynoldsNumber, referenceCurves, sampleReferenceCurve, turbulenceFactor } from '@tunnelwright/aero';
import type { ReviewPoint, SphereCalibration } from '@tunnelwright/contracts';

/** Points drawn along each reference curve. */
const CURVE_SAMPLES = 60;

const SOURCE =
  'Critical Re where the measured sphere C_D falls through 0.3, TF = 385 000 / Re_crit: Barlow, Rae & Pope 1999, Low-Speed Wind Tunnel Testing, 3rd ed., ch. 4, after Dryden (from memory)';

/**
 * What a sphere calibration run says about the tunnel: the published smooth-sphere C_D(Re) curves sampled over the
 * run's Reynolds-number range (each clipped to the range its source states valid), the critical Reynolds number
 * found in the measured points the analyst kept, and the turbulence factor from it.
 *
 * @param points - the run's reviewed points; excluded points are left out of Re_crit but still set the range
 */
export function sphereCalibration(points: readonly ReviewPoint[]): SphereCalibration {
  const measured = points.filter((p) => p.reynoldsNumber !== null && p.reynoldsNumber > 0 && p.dragCoefficient !== null);
  const reynolds = measured.map((p) => p.reynoldsNumber as number);
  const curves: SphereCalibration['referenceCurves'] = [];
  if (reynolds.length > 0) {
    let low = Math.min(...reynolds);
    let high = Math.max(...reynolds);
    // A single speed still gets a short stretch of curve around it to compare with.
    if (high <= low * 1.001) [low, high] = [low * 0.9, high * 1.1];
    for (const curve of referenceCurves.filter((c) => c.body === 'sphere')) {
      const from = Math.max(low, curve.validRange.min);
      const to = Math.min(high, curve.validRange.max);
      if (!(to > from)) continue;
      curves.push({ id: curve.id, label: curve.label, source: curve.source, points: sampleReferenceCurve(curve.id, { from, to, count: CURVE_SAMPLES }) });
    }
  }
  const kept = measured
    .filter((p) => p.exclusion === null)
    .map((p) => ({ reynoldsNumber: p.reynoldsNumber as number, dragCoefficient: (p.dragCoefficient as { value: number }).value }));
  const critical = criticalReynoldsNumber(kept);
  if (critical.reynoldsNumber === null) {
    return { referenceCurves: curves, criticalReynoldsNumber: null, turbulenceFactor: null, reason: `No critical Reynolds number: ${critical.reason}.`, source: SOURCE };
  }
  const reason = critical.crossingCount > 1 ? `C_D falls through 0.3 ${critical.crossingCount} times; the first crossing is used. Check the sweep for repeats or noise.` : null;
  return {
    referenceCurves: curves,
    criticalReynoldsNumber: critical.reynoldsNumber,
    turbulenceFactor: turbulenceFactor(critical.reynoldsNumber),
    reason,
    source: SOURCE,
  };
}
