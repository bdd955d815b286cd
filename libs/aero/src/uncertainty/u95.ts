import { requireNonNegative } from '../errors/require-number';

/**
 * Large-sample 95 % uncertainty from bias and precision limits: U95 = √(B² + P²).
 * Source: AIAA S-071A-1999 (form from memory); Coleman & Steele 1995, AIAA J. 33(10):1888 (page from memory).
 *
 * @param bias - bias (systematic) limit B, unit of the result, ≥ 0
 * @param precision - precision limit P, unit of the result, ≥ 0 (see `precisionLimit`)
 * @returns U95, unit of the result
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for a negative limit
 * @example
 * u95(0.004, 0.005367); // ≈ 0.006693
 */
export function u95(bias: number, precision: number): number {
  requireNonNegative('u95', 'bias limit', bias, '');
  requireNonNegative('u95', 'precision limit', precision, '');
  return Math.hypot(bias, precision);
}
