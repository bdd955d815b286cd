import { requireNonNegative, requirePositive } from '../errors/require-number';

/** Coverage factor for a level of confidence of about 95 % (GUM, JCGM 100:2008, 6.3.3 — clause from memory). */
export const COVERAGE_FACTOR_95 = 2;

/**
 * Expanded uncertainty: U = k · u_c.
 * Source: GUM, JCGM 100:2008, 6.2.1, eq. 18 (clause and equation numbers from memory); k = 2 gives about 95 %.
 *
 * @param combinedStandardUncertainty - combined standard uncertainty u_c, unit of the result
 * @param coverageFactor - coverage factor k (dimensionless), default 2
 * @returns expanded uncertainty U, unit of the result
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity; `OUT_OF_RANGE` for u_c < 0 or k ≤ 0
 * @example
 * expandedUncertainty(0.03876); // 0.07752
 */
export function expandedUncertainty(combinedStandardUncertainty: number, coverageFactor = COVERAGE_FACTOR_95): number {
  requireNonNegative('expandedUncertainty', 'combined standard uncertainty', combinedStandardUncertainty, '');
  requirePositive('expandedUncertainty', 'coverage factor', coverageFactor, '');
  return coverageFactor * combinedStandardUncertainty;
}
