import { requireNonNegative, requirePositive } from '../errors/require-number';

/**
 * Mach number: M = V/a.
 * Source: definition (Anderson, Modern Compressible Flow; Barlow, Rae & Pope 1999, ch. 1).
 *
 * @param speed - airspeed V, m/s
 * @param speedOfSound - speed of sound a, m/s
 * @returns Mach number (dimensionless)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity; `OUT_OF_RANGE` for V < 0 or a ≤ 0
 * @example
 * machNumber(34.0294, 340.294); // 0.1
 */
export function machNumber(speed: number, speedOfSound: number): number {
  requireNonNegative('machNumber', 'speed', speed, 'm/s');
  requirePositive('machNumber', 'speed of sound', speedOfSound, 'm/s');
  return speed / speedOfSound;
}
