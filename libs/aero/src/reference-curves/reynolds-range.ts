import { requirePositive } from '../errors/require-number';

/** Reynolds-number range over which a drag curve is stated valid (bounds included, dimensionless). */
export interface ReynoldsRange {
  /** Lowest Reynolds number; 0 means the fit runs down to creeping (Stokes) flow. */
  readonly min: number;
  /** Highest Reynolds number. */
  readonly max: number;
}

/**
 * Checks a Reynolds number for a drag curve: finite and above zero.
 *
 * @param fn - calling function, for the message
 * @param reynoldsNumber - Reynolds number (dimensionless)
 * @returns the same Reynolds number
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for Re ≤ 0
 * @example
 * requireReynoldsNumber('sphereDragWhite', 1e4); // 1e4
 */
export function requireReynoldsNumber(fn: string, reynoldsNumber: number): number {
  return requirePositive(fn, 'Reynolds number', reynoldsNumber, '');
}
