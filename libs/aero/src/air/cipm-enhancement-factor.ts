import { requireFinite, requirePositive } from '../errors/require-number';
import { CELSIUS_ZERO } from '../units/nist-constants';
import { AeroInputError } from '../errors/aero-input-error';
import { CIPM_ENHANCEMENT_COEFFICIENTS } from './cipm-constants';

/**
 * Enhancement factor of water vapour in air, CIPM-2007 form.
 *
 * f = α + β·p + γ·t², with p in pascals and t in degrees Celsius.
 *
 * Source: Picard et al. 2008, Metrologia 45:149 (CIPM-2007), eq. A1.3 (equation number from memory).
 *
 * @param pressure - total air pressure p, Pa
 * @param temperatureCelsius - air temperature t, °C
 * @returns enhancement factor f (dimensionless, ≈ 1.004)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for p ≤ 0 or t below absolute zero
 * @example
 * cipmEnhancementFactor(101325, 20); // ≈ 1.004026
 */
export function cipmEnhancementFactor(pressure: number, temperatureCelsius: number): number {
  requirePositive('cipmEnhancementFactor', 'pressure', pressure, 'Pa');
  requireFinite('cipmEnhancementFactor', 'temperature', temperatureCelsius, '°C');
  if (temperatureCelsius <= -CELSIUS_ZERO) {
    throw new AeroInputError('OUT_OF_RANGE', `\`cipmEnhancementFactor\` requires a temperature above absolute zero (−273.15 °C); got ${temperatureCelsius} °C`);
  }
  const { alpha, beta, gamma } = CIPM_ENHANCEMENT_COEFFICIENTS;
  return alpha + beta * pressure + gamma * temperatureCelsius * temperatureCelsius;
}
