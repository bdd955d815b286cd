import { requirePositive } from '../errors/require-number';
import { CIPM_SATURATION_COEFFICIENTS } from './cipm-constants';

/**
 * Saturation vapour pressure of water over a plane surface, CIPM-2007 form.
 *
 * p_sv = exp(A·T² + B·T + C + D/T), with T the thermodynamic temperature in kelvin.
 *
 * Source: Picard et al. 2008, Metrologia 45:149 (CIPM-2007), eq. A1.2 (equation number from memory); valid 15–27 °C with the rest of the equation.
 *
 * @param temperature - thermodynamic temperature T, K
 * @returns saturation vapour pressure p_sv, Pa
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for T ≤ 0 K
 * @example
 * cipmSaturationVapourPressure(293.15); // ≈ 2339.16 Pa
 */
export function cipmSaturationVapourPressure(temperature: number): number {
  requirePositive('cipmSaturationVapourPressure', 'temperature', temperature, 'K');
  const { A, B, C, D } = CIPM_SATURATION_COEFFICIENTS;
  return Math.exp(A * temperature * temperature + B * temperature + C + D / temperature);
}
