import { requireNonNegative } from '../errors/require-number';
import { requireBlockage } from './require-blockage';

/**
 * Dynamic pressure corrected for blockage: q_c = q_u · (1 + ε_t)², with ε_t = ε_sb + ε_wb.
 * Source: Barlow, Rae & Pope 1999, Low-Speed Wind Tunnel Testing, 3rd ed., ch. 10.
 *
 * @param dynamicPressure - uncorrected dynamic pressure q_u, Pa
 * @param totalBlockage - total blockage factor ε_t (dimensionless, > −1)
 * @returns corrected dynamic pressure q_c, Pa
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity; `OUT_OF_RANGE` for q_u < 0 or ε_t ≤ −1
 * @example
 * correctedDynamicPressure(500, 0.01186); // ≈ 511.93 Pa
 */
export function correctedDynamicPressure(dynamicPressure: number, totalBlockage: number): number {
  requireNonNegative('correctedDynamicPressure', 'dynamic pressure', dynamicPressure, 'Pa');
  const factor = 1 + requireBlockage('correctedDynamicPressure', totalBlockage);
  return dynamicPressure * factor * factor;
}
