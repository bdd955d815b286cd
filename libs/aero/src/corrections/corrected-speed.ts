import { requireNonNegative } from '../errors/require-number';
import { requireBlockage } from './require-blockage';

/**
 * Airspeed corrected for blockage: V_c = V_u · (1 + ε_t).
 * Source: Barlow, Rae & Pope 1999, Low-Speed Wind Tunnel Testing, 3rd ed., ch. 10.
 *
 * @param speed - uncorrected airspeed V_u, m/s
 * @param totalBlockage - total blockage factor ε_t (dimensionless, > −1)
 * @returns corrected airspeed V_c, m/s
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity; `OUT_OF_RANGE` for V_u < 0 or ε_t ≤ −1
 * @example
 * correctedSpeed(30, 0.01); // 30.3 m/s
 */
export function correctedSpeed(speed: number, totalBlockage: number): number {
  requireNonNegative('correctedSpeed', 'speed', speed, 'm/s');
  return speed * (1 + requireBlockage('correctedSpeed', totalBlockage));
}
