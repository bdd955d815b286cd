import { AeroInputError } from '../errors/aero-input-error';
import { requirePositive } from '../errors/require-number';
import type { DragPoint } from './critical-reynolds-number';
import { referenceCurves, type ReferenceCurveId } from './reference-curves';

/** Where and how densely to sample a reference curve. */
export interface SampleRange {
  /** Lowest Reynolds number (dimensionless, > 0). */
  readonly from: number;
  /** Highest Reynolds number (dimensionless, > from). */
  readonly to: number;
  /** Number of points, an integer ≥ 2. */
  readonly count: number;
}

/**
 * Samples a reference drag curve at log-spaced Reynolds numbers, for plotting.
 *
 * Re_i = from · (to/from)^(i/(count − 1)), i = 0 … count − 1; the first and last points are exactly `from` and `to`.
 *
 * @param id - which curve, from {@link referenceCurves}
 * @param range - from and to (dimensionless Re) and the point count
 * @returns `count` points { reynoldsNumber, dragCoefficient }, Re rising
 * @throws {AeroInputError} `UNKNOWN_ID` for an unknown curve; `NOT_FINITE` or `OUT_OF_RANGE` for a bad range,
 *   a count below 2 or not whole, or a range outside the curve's stated validity
 * @example
 * sampleReferenceCurve('sphere-white', { from: 1, to: 1e5, count: 6 }); // Re 1, 10, 100, …, 1e5
 */
export function sampleReferenceCurve(id: ReferenceCurveId, range: SampleRange): DragPoint[] {
  const fn = 'sampleReferenceCurve';
  const curve = referenceCurves.find((candidate) => candidate.id === id);
  if (!curve) {
    throw new AeroInputError('UNKNOWN_ID', `\`${fn}\` requires a curve id of ${referenceCurves.map((c) => c.id).join(', ')}; got ${String(id)}`);
  }
  const from = requirePositive(fn, '"from" Reynolds number', range.from, '');
  const to = requirePositive(fn, '"to" Reynolds number', range.to, '');
  if (to <= from) {
    throw new AeroInputError('OUT_OF_RANGE', `\`${fn}\` requires "to" above "from"; got from ${from} and to ${to}`);
  }
  if (!Number.isInteger(range.count) || range.count < 2) {
    throw new AeroInputError('OUT_OF_RANGE', `\`${fn}\` requires a whole point count of at least 2; got ${range.count}`);
  }
  if (from < curve.validRange.min || to > curve.validRange.max) {
    throw new AeroInputError(
      'OUT_OF_RANGE',
      `\`${fn}\` requires a range inside the validity of ${id} (Re ${curve.validRange.min} to ${curve.validRange.max}); got ${from} to ${to}`,
    );
  }
  const last = range.count - 1;
  const ratio = to / from;
  return Array.from({ length: range.count }, (_, i) => {
    const reynoldsNumber = i === 0 ? from : i === last ? to : from * ratio ** (i / last);
    return { reynoldsNumber, dragCoefficient: curve.fn(reynoldsNumber) };
  });
}
