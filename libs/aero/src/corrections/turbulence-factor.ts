import { requirePositive } from '../errors/require-number';

/**
 * Critical Reynolds number of a smooth sphere in free air (C_D = 0.3), used as the turbulence-sphere reference
 * (Barlow, Rae & Pope 1999, ch. 4, after Dryden — from memory).
 */
export const SPHERE_CRITICAL_REYNOLDS_FREE_AIR = 385_000;

/**
 * Turbulence factor of a tunnel from a sphere test.
 *
 * TF = 385 000 / Re_crit, where Re_crit is the Reynolds number at which the measured sphere C_D falls through 0.3.
 * The effective Reynolds number of a test is then TF · Re_test.
 *
 * Source: Barlow, Rae & Pope 1999, Low-Speed Wind Tunnel Testing, 3rd ed., ch. 4, after Dryden (from memory).
 *
 * @param criticalReynoldsNumber - measured critical Reynolds number Re_crit (dimensionless); find it with
 *   `criticalReynoldsNumber` from the measured points, not from a curve fit
 * @returns turbulence factor TF (dimensionless, ≥ 1 in a tunnel with some turbulence)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for Re_crit ≤ 0
 * @example
 * turbulenceFactor(270_000); // ≈ 1.425926
 */
export function turbulenceFactor(criticalReynoldsNumber: number): number {
  requirePositive('turbulenceFactor', 'critical Reynolds number', criticalReynoldsNumber, '');
  return SPHERE_CRITICAL_REYNOLDS_FREE_AIR / criticalReynoldsNumber;
}
