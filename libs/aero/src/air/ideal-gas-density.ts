import { AeroInputError } from '../errors/aero-input-error';
import { requireFraction, requirePositive } from '../errors/require-number';
import { CELSIUS_ZERO } from '../units/nist-constants';
import { buckSaturationVapourPressure } from './buck-saturation-vapour-pressure';
import type { MoistAirState } from './moist-air-state';

/** Specific gas constant of dry air used in the simple moist-air form, J/(kg·K) (common practice). */
export const DRY_AIR_GAS_CONSTANT = 287.05;
/** Specific gas constant of water vapour used in the simple moist-air form, J/(kg·K) (common practice). */
export const WATER_VAPOUR_GAS_CONSTANT = 461.52;

/**
 * Density of moist air as a mixture of ideal gases.
 *
 * ρ = (p − e)/(R_d·T) + e/(R_v·T), with e = RH·e_s(t) from Buck's equation, R_d = 287.05 and R_v = 461.52 J/(kg·K).
 * It omits the compressibility and enhancement factors, so it reads about 0.037 % below CIPM-2007 at 20 °C, 50 %.
 *
 * Source: the partial-pressure form of Dalton's law (common practice), with e_s from Buck 1981,
 * J. Appl. Meteorol. 20:1527.
 *
 * @param state - pressure (Pa), temperature (K), relative humidity (fraction 0–1)
 * @returns density ρ, kg/m³
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity; `OUT_OF_RANGE` for p ≤ 0, T ≤ 0, RH outside 0–1,
 *   or a vapour pressure above the total pressure
 * @example
 * idealGasDensity({ pressure: 101325, temperature: 293.15, relativeHumidity: 0.5 }); // ≈ 1.198866 kg/m³
 */
export function idealGasDensity(state: MoistAirState): number {
  const { pressure, temperature, relativeHumidity } = state;
  requirePositive('idealGasDensity', 'pressure', pressure, 'Pa');
  requirePositive('idealGasDensity', 'temperature', temperature, 'K');
  requireFraction('idealGasDensity', 'relative humidity', relativeHumidity);
  const vapourPressure = relativeHumidity * buckSaturationVapourPressure(temperature - CELSIUS_ZERO);
  if (vapourPressure > pressure) {
    throw new AeroInputError('OUT_OF_RANGE', `\`idealGasDensity\` requires a vapour pressure below the total pressure; got e = ${vapourPressure} Pa at p = ${pressure} Pa`);
  }
  return (pressure - vapourPressure) / (DRY_AIR_GAS_CONSTANT * temperature) + vapourPressure / (WATER_VAPOUR_GAS_CONSTANT * temperature);
}
