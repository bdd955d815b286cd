import { requirePositive } from '../errors/require-number';

/**
 * Kinematic viscosity: ν = μ/ρ.
 * Source: definition (e.g. Barlow, Rae & Pope 1999, ch. 1).
 *
 * @param viscosity - dynamic viscosity μ, Pa·s
 * @param density - density ρ, kg/m³
 * @returns kinematic viscosity ν, m²/s
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for μ ≤ 0 or ρ ≤ 0
 * @example
 * kinematicViscosity(1.7894e-5, 1.225); // ≈ 1.4607e-5 m²/s
 */
export function kinematicViscosity(viscosity: number, density: number): number {
  requirePositive('kinematicViscosity', 'viscosity', viscosity, 'Pa·s');
  requirePositive('kinematicViscosity', 'density', density, 'kg/m³');
  return viscosity / density;
}
