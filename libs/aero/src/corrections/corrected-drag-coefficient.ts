import { requireFinite } from '../errors/require-number';
import { requireBlockage } from './require-blockage';

/**
 * Force coefficient corrected for blockage: C_c = C_u / (1 + ε_t)² (≈ C_u·(1 − 2ε_t) for small ε_t).
 * Source: Barlow, Rae & Pope 1999, Low-Speed Wind Tunnel Testing, 3rd ed., ch. 10.
 *
 * @param uncorrectedCoefficient - uncorrected force coefficient C_u (dimensionless)
 * @param totalBlockage - total blockage factor ε_t (dimensionless, > −1)
 * @returns corrected coefficient C_c (dimensionless)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity; `OUT_OF_RANGE` for ε_t ≤ −1
 * @example
 * correctedDragCoefficient(0.35, 0.01); // ≈ 0.343104 (0.35/1.0201)
 */
export function correctedDragCoefficient(uncorrectedCoefficient: number, totalBlockage: number): number {
  requireFinite('correctedDragCoefficient', 'uncorrected coefficient', uncorrectedCoefficient, '');
  const factor = 1 + requireBlockage('correctedDragCoefficient', totalBlockage);
  return uncorrectedCoefficient / (factor * factor);
}
