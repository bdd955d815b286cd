import { AeroInputError } from '../errors/aero-input-error';
import { requireFinite } from '../errors/require-number';

/** One measured point of a drag-versus-Reynolds-number sweep. */
export interface DragPoint {
  /** Reynolds number (dimensionless, > 0). */
  readonly reynoldsNumber: number;
  /** Measured drag coefficient (dimensionless). */
  readonly dragCoefficient: number;
}

/** A crossing found in the measured points. */
export interface CriticalReynoldsFound {
  /** Reynolds number at which C_D falls through the threshold. */
  readonly reynoldsNumber: number;
  /** The measured points either side of the crossing, lower Re first. */
  readonly bracket: readonly [DragPoint, DragPoint];
  /** How many downward crossings the sweep has; more than one means a noisy or repeated sweep. */
  readonly crossingCount: number;
}

/** No crossing in the measured points, and why. */
export interface CriticalReynoldsMissing {
  readonly reynoldsNumber: null;
  /** Plain-language reason, e.g. "every measured C_D is above 0.3 (lowest 0.41 at Re 3.1e5)". */
  readonly reason: string;
}

/** Result of {@link criticalReynoldsNumber}. */
export type CriticalReynoldsResult = CriticalReynoldsFound | CriticalReynoldsMissing;

/** Drag coefficient that defines the critical Reynolds number of a sphere (Barlow, Rae & Pope 1999, ch. 4 — from memory). */
export const SPHERE_CRITICAL_DRAG_COEFFICIENT = 0.3;

/**
 * Critical Reynolds number of a sphere from measured points: the Re at which C_D first falls through the threshold.
 *
 * Points are sorted by Re; the first pair with C_D,i ≥ threshold > C_D,i+1 brackets the crossing, and
 * ln Re = ln Re_i + (C_D,i − threshold)/(C_D,i − C_D,i+1) · (ln Re_i+1 − ln Re_i) (linear in log Re).
 * Use the measured points, never a curve fit.
 *
 * Source: Barlow, Rae & Pope 1999, Low-Speed Wind Tunnel Testing, 3rd ed., ch. 4 (turbulence sphere; C_D = 0.3
 * criterion from memory).
 *
 * @param points - measured { reynoldsNumber, dragCoefficient } in any order
 * @param threshold - drag coefficient that marks the crisis, default 0.3
 * @returns the crossing with its bracketing points, or `{ reynoldsNumber: null, reason }` if none
 * @throws {AeroInputError} `NOT_FINITE` for a NaN or infinite value, `OUT_OF_RANGE` for Re ≤ 0, each naming the point
 * @example
 * criticalReynoldsNumber([{ reynoldsNumber: 2e5, dragCoefficient: 0.42 }, { reynoldsNumber: 2.5e5, dragCoefficient: 0.2 }]);
 * // { reynoldsNumber: ≈ 225 886, … }
 */
export function criticalReynoldsNumber(points: readonly DragPoint[], threshold = SPHERE_CRITICAL_DRAG_COEFFICIENT): CriticalReynoldsResult {
  const fn = 'criticalReynoldsNumber';
  requireFinite(fn, 'threshold', threshold, '');
  points.forEach((point, index) => {
    requireFinite(fn, `drag coefficient at point ${index}`, point.dragCoefficient, '');
    requireFinite(fn, `Reynolds number at point ${index}`, point.reynoldsNumber, '');
    if (point.reynoldsNumber <= 0) {
      throw new AeroInputError('OUT_OF_RANGE', `\`${fn}\` requires a positive Reynolds number at point ${index}; got ${point.reynoldsNumber}`);
    }
  });
  if (points.length < 2) {
    return { reynoldsNumber: null, reason: `needs at least two measured points; got ${points.length}` };
  }
  const sorted = [...points].sort((a, b) => a.reynoldsNumber - b.reynoldsNumber);
  let found: CriticalReynoldsFound | null = null;
  let crossingCount = 0;
  for (let i = 0; i + 1 < sorted.length; i++) {
    const lower = sorted[i];
    const upper = sorted[i + 1];
    if (lower.dragCoefficient >= threshold && upper.dragCoefficient < threshold) {
      crossingCount++;
      if (!found) {
        const fraction = (lower.dragCoefficient - threshold) / (lower.dragCoefficient - upper.dragCoefficient);
        const logRe = Math.log(lower.reynoldsNumber) + fraction * (Math.log(upper.reynoldsNumber) - Math.log(lower.reynoldsNumber));
        // An exact hit on the threshold returns the measured Re itself, free of exp/log round-off.
        const reynoldsNumber = fraction === 0 ? lower.reynoldsNumber : Math.exp(logRe);
        found = { reynoldsNumber, bracket: [lower, upper], crossingCount: 0 };
      }
    }
  }
  if (found) return { ...found, crossingCount };
  const lowest = sorted.reduce((a, b) => (b.dragCoefficient < a.dragCoefficient ? b : a));
  const highest = sorted.reduce((a, b) => (b.dragCoefficient > a.dragCoefficient ? b : a));
  if (lowest.dragCoefficient >= threshold) {
    return { reynoldsNumber: null, reason: `every measured C_D is at or above ${threshold} (lowest ${lowest.dragCoefficient} at Re ${lowest.reynoldsNumber}); extend the sweep to higher Re` };
  }
  if (highest.dragCoefficient < threshold) {
    return { reynoldsNumber: null, reason: `every measured C_D is below ${threshold} (highest ${highest.dragCoefficient} at Re ${highest.reynoldsNumber}); extend the sweep to lower Re` };
  }
  return { reynoldsNumber: null, reason: `C_D never falls through ${threshold} as Re increases (it only rises through it)` };
}
