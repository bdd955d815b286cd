import { AeroInputError } from '../errors/aero-input-error';
import { requireFraction, requirePositive } from '../errors/require-number';
import { CELSIUS_ZERO } from '../units/nist-constants';
import { cipmEnhancementFactor } from './cipm-enhancement-factor';
import { cipmSaturationVapourPressure } from './cipm-saturation-vapour-pressure';
import type { MoistAirState } from './moist-air-state';

/**
 * Mole fraction of water vapour from relative humidity, CIPM-2007 form.
 *
 * x_v = h · f(p, t) · p_sv(T) / p, with h the relative humidity as a fraction.
 *
 * Source: Picard et al. 2008, Metrologia 45:149 (CIPM-2007), eq. A1.1 (equation number from memory).
 *
 * @param state - pressure (Pa), temperature (K) and relative humidity (fraction 0–1)
 * @returns mole fraction of water vapour x_v (0–1)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity; `OUT_OF_RANGE` for p ≤ 0, T ≤ 0, RH outside 0–1,
 *   or a vapour pressure above the total pressure
 * @example
 * cipmVapourMoleFraction({ pressure: 101325, temperature: 293.15, relativeHumidity: 0.5 }); // ≈ 0.011589
 */
export function cipmVapourMoleFraction(state: MoistAirState): number {
  const { pressure, temperature, relativeHumidity } = state;
  requirePositive('cipmVapourMoleFraction', 'pressure', pressure, 'Pa');
  requirePositive('cipmVapourMoleFraction', 'temperature', temperature, 'K');
  requireFraction('cipmVapourMoleFraction', 'relative humidity', relativeHumidity);
  const x = (relativeHumidity * cipmEnhancementFactor(pressure, temperature - CELSIUS_ZERO) * cipmSaturationVapourPressure(temperature)) / pressure;
  if (x > 1) {
    throw new AeroInputError(
      'OUT_OF_RANGE',
      `\`cipmVapourMoleFraction\` requires a vapour pressure below the total pressure; got x_v = ${x} at ${pressure} Pa and ${temperature} K`,
    );
  }
  return x;
}
