import { AeroInputError } from '../errors/aero-input-error';
import { requireFinite, requirePositive } from '../errors/require-number';

/**
 * Airspeed from dynamic pressure: V = √(2q/ρ).
 * Source: definition of dynamic pressure q = ½ρV² (Barlow, Rae & Pope 1999, ch. 1).
 *
 * @param dynamicPressure - dynamic pressure q, Pa (must be above zero: the wind must be on)
 * @param density - air density ρ, kg/m³
 * @returns airspeed V, m/s
 * @throws {AeroInputError} `ZERO_WIND` for q ≤ 0; `NOT_FINITE` for NaN or ±Infinity; `OUT_OF_RANGE` for ρ ≤ 0
 * @example
 * speedFromDynamicPressure(551.25, 1.225); // 30 m/s
 */
export function speedFromDynamicPressure(dynamicPressure: number, density: number): number {
  requireFinite('speedFromDynamicPressure', 'dynamic pressure', dynamicPressure, 'Pa');
  if (dynamicPressure <= 0) {
    throw new AeroInputError('ZERO_WIND', `\`speedFromDynamicPressure\` requires a positive dynamic pressure; got ${dynamicPressure} Pa (is the wind on?)`);
  }
  requirePositive('speedFromDynamicPressure', 'density', density, 'kg/m³');
  return Math.sqrt((2 * dynamicPressure) / density);
}
