import { AeroInputError } from '../errors/aero-input-error';
import { requireFinite } from '../errors/require-number';
import { CELSIUS_ZERO } from '../units/nist-constants';

/** Coefficients of Buck's e_s over water (1996 revision): 611.21 Pa, 18.678, 234.5 °C, 257.14 °C. */
export const BUCK_COEFFICIENTS = Object.freeze({ a: 611.21, b: 18.678, c: 234.5, d: 257.14 });

/**
 * Saturation vapour pressure over water, Buck's equation.
 *
 * e_s = 611.21 · exp[(18.678 − t/234.5) · t/(257.14 + t)] Pa, with t in degrees Celsius.
 *
 * Source: Buck 1981, "New equations for computing vapor pressure and enhancement factor",
 * J. Appl. Meteorol. 20:1527–1532, for the form. These coefficients are Buck's 1996 revision of it (Buck Research
 * CR-1A hygrometer manual); the 1981 paper itself printed (18.729 − t/227.3)·t/(257.87 + t) (from memory).
 *
 * @param temperatureCelsius - air temperature t, °C
 * @returns saturation vapour pressure e_s, Pa
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` at or below absolute zero
 * @example
 * buckSaturationVapourPressure(20); // ≈ 2338.34 Pa
 */
export function buckSaturationVapourPressure(temperatureCelsius: number): number {
  requireFinite('buckSaturationVapourPressure', 'temperature', temperatureCelsius, '°C');
  if (temperatureCelsius <= -CELSIUS_ZERO) {
    throw new AeroInputError('OUT_OF_RANGE', `\`buckSaturationVapourPressure\` requires a temperature above absolute zero (−273.15 °C); got ${temperatureCelsius} °C`);
  }
  const { a, b, c, d } = BUCK_COEFFICIENTS;
  const t = temperatureCelsius;
  return a * Math.exp(((b - t / c) * t) / (d + t));
}
