import { CELSIUS_ZERO } from '../units/nist-constants';
import type { MoistAirState } from './moist-air-state';

/**
 * Range over which CIPM-2007 is stated valid: 600–1100 hPa and 15–27 °C (288.15–300.15 K).
 * Source: Picard et al. 2008, Metrologia 45:149.
 */
export const cipmValidity = Object.freeze({
  /** Lowest pressure, Pa (600 hPa). */
  minPressure: 60_000,
  /** Highest pressure, Pa (1100 hPa). */
  maxPressure: 110_000,
  /** Lowest temperature, K (15 °C). */
  minTemperature: 15 + CELSIUS_ZERO,
  /** Highest temperature, K (27 °C). */
  maxTemperature: 27 + CELSIUS_ZERO,
});

/**
 * Whether a moist-air state lies inside the CIPM-2007 validity range (600–1100 hPa, 15–27 °C).
 * The density formula still works outside it; the pipeline uses this to attach a warning.
 * Source: Picard et al. 2008, Metrologia 45:149.
 *
 * @param state - pressure (Pa) and temperature (K); relative humidity is not limited
 * @returns true inside the range (bounds included), false outside or for NaN
 * @example
 * isWithinCipmValidity({ pressure: 101325, temperature: 293.15 }); // true
 */
export function isWithinCipmValidity(state: Pick<MoistAirState, 'pressure' | 'temperature'>): boolean {
  const { pressure, temperature } = state;
  return (
    pressure >= cipmValidity.minPressure &&
    pressure <= cipmValidity.maxPressure &&
    temperature >= cipmValidity.minTemperature &&
    temperature <= cipmValidity.maxTemperature
  );
}
