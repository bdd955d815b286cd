import { requireNonNegative, requirePositive } from '../errors/require-number';

/**
 * Dynamic pressure: q = ½·ρ·V².
 * Source: definition (Barlow, Rae & Pope 1999, ch. 1; Anderson, Fundamentals of Aerodynamics).
 *
 * @param density - air density ρ, kg/m³
 * @param speed - airspeed V, m/s (zero allowed: no wind gives q = 0)
 * @returns dynamic pressure q, Pa
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for ρ ≤ 0 or V < 0
 * @example
 * dynamicPressure(1.225, 30); // 551.25 Pa
 */
export function dynamicPressure(density: number, speed: number): number {
  requirePositive('dynamicPressure', 'density', density, 'kg/m³');
  requireNonNegative('dynamicPressure', 'speed', speed, 'm/s');
  return 0.5 * density * speed * speed;
}
