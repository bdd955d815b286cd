import { requireNonNegative, requirePositive } from '../errors/require-number';

/**
 * Effective Reynolds number of a tunnel test: Re_eff = TF · Re_test.
 * Source: Barlow, Rae & Pope 1999, ch. 4, after Dryden (from memory).
 *
 * @param reynoldsNumber - test Reynolds number Re_test (dimensionless)
 * @param turbulenceFactor - the tunnel's turbulence factor TF (dimensionless)
 * @returns effective Reynolds number (dimensionless)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity; `OUT_OF_RANGE` for Re < 0 or TF ≤ 0
 * @example
 * effectiveReynoldsNumber(1e6, 1.22); // 1.22e6
 */
export function effectiveReynoldsNumber(reynoldsNumber: number, turbulenceFactor: number): number {
  requireNonNegative('effectiveReynoldsNumber', 'Reynolds number', reynoldsNumber, '');
  requirePositive('effectiveReynoldsNumber', 'turbulence factor', turbulenceFactor, '');
  return turbulenceFactor * reynoldsNumber;
}
