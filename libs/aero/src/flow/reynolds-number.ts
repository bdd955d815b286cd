import { requireNonNegative, requirePositive } from '../errors/require-number';

/**
 * Reynolds number: Re = ρ·V·L/μ.
 * Source: definition (Barlow, Rae & Pope 1999, ch. 1; White, Fluid Mechanics).
 *
 * @param density - air density ρ, kg/m³
 * @param speed - airspeed V, m/s
 * @param length - reference length L, m
 * @param viscosity - dynamic viscosity μ, Pa·s
 * @returns Reynolds number (dimensionless)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity; `OUT_OF_RANGE` for ρ, L or μ ≤ 0, or V < 0
 * @example
 * reynoldsNumber(1.225, 30, 1, 1.7894e-5); // ≈ 2.053761e6
 */
export function reynoldsNumber(density: number, speed: number, length: number, viscosity: number): number {
  requirePositive('reynoldsNumber', 'density', density, 'kg/m³');
  requireNonNegative('reynoldsNumber', 'speed', speed, 'm/s');
  requirePositive('reynoldsNumber', 'reference length', length, 'm');
  requirePositive('reynoldsNumber', 'viscosity', viscosity, 'Pa·s');
  return (density * speed * length) / viscosity;
}
