import { AeroInputError } from '../errors/aero-input-error';
import { requireNonNegative } from '../errors/require-number';

/**
 * Large-sample precision limit of a mean: P = 2·S/√N.
 * Source: AIAA S-071A-1999, Assessment of Experimental Uncertainty with Application to Wind Tunnel Testing
 * (form from memory); Coleman & Steele 1995, AIAA J. 33(10):1888 (page from memory).
 *
 * @param standardDeviation - sample standard deviation S of the readings, their unit
 * @param n - number of readings N, a whole number ≥ 1
 * @returns precision limit P, unit of the readings
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity; `OUT_OF_RANGE` for S < 0 or N not a whole number ≥ 1
 * @example
 * precisionLimit(0.006, 5); // ≈ 0.005367
 */
export function precisionLimit(standardDeviation: number, n: number): number {
  requireNonNegative('precisionLimit', 'standard deviation', standardDeviation, '');
  if (!Number.isInteger(n) || n < 1) {
    throw new AeroInputError('OUT_OF_RANGE', `\`precisionLimit\` requires a whole number of readings of at least 1; got ${n}`);
  }
  return (2 * standardDeviation) / Math.sqrt(n);
}
