import { requireFraction, requirePositive } from '../errors/require-number';
import { CELSIUS_ZERO } from '../units/nist-constants';
import { CIPM_COMPRESSIBILITY_COEFFICIENTS } from './cipm-constants';

/**
 * Compressibility factor of moist air, CIPM-2007 form.
 *
 * Z = 1 − (p/T)·[a0 + a1·t + a2·t² + (b0 + b1·t)·x_v + (c0 + c1·t)·x_v²] + (p/T)²·(d + e·x_v²),
 * with T in kelvin and t = T − 273.15 in degrees Celsius.
 *
 * Source: Picard et al. 2008, Metrologia 45:149 (CIPM-2007), eq. A1.4 (equation number from memory).
 *
 * @param pressure - total air pressure p, Pa
 * @param temperature - thermodynamic temperature T, K
 * @param vapourMoleFraction - mole fraction of water vapour x_v (0–1)
 * @returns compressibility factor Z (dimensionless, ≈ 0.9996 near room conditions)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for p ≤ 0, T ≤ 0 or x_v outside 0–1
 * @example
 * cipmCompressibility(101325, 293.15, 0.011589); // ≈ 0.9996148
 */
export function cipmCompressibility(pressure: number, temperature: number, vapourMoleFraction: number): number {
  requirePositive('cipmCompressibility', 'pressure', pressure, 'Pa');
  requirePositive('cipmCompressibility', 'temperature', temperature, 'K');
  requireFraction('cipmCompressibility', 'vapour mole fraction', vapourMoleFraction);
  const { a0, a1, a2, b0, b1, c0, c1, d, e } = CIPM_COMPRESSIBILITY_COEFFICIENTS;
  const t = temperature - CELSIUS_ZERO;
  const x = vapourMoleFraction;
  const pOverT = pressure / temperature;
  return 1 - pOverT * (a0 + a1 * t + a2 * t * t + (b0 + b1 * t) * x + (c0 + c1 * t) * x * x) + pOverT * pOverT * (d + e * x * x);
}
