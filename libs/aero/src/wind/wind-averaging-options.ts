import { AeroInputError } from '../errors/aero-input-error';
import { requireNonNegative, requirePositive } from '../errors/require-number';
import { MILE_PER_HOUR } from '../units/nist-constants';

/** Vehicle speed of the SAE J1252 wind-averaged drag, m/s (55 mph; value from memory). */
export const J1252_VEHICLE_SPEED = 55 * MILE_PER_HOUR;
/** Wind speed of the SAE J1252 wind-averaged drag, m/s (7 mph; value from memory). */
export const J1252_WIND_SPEED = 7 * MILE_PER_HOUR;
/** Default number of Simpson intervals over the wind direction 0…π. */
export const WIND_AVERAGING_STEPS = 720;

/** Speeds and resolution of the wind-averaging integral. */
export interface WindAveragingOptions {
  /** Vehicle speed V, m/s; default 55 mph. */
  readonly vehicleSpeed?: number;
  /** Wind speed V_w, m/s; default 7 mph. */
  readonly windSpeed?: number;
  /** Even number of Simpson intervals over 0…π; default 720 (0.25° each). */
  readonly steps?: number;
}

/** Options with defaults filled and checked. */
export interface ResolvedWindAveragingOptions {
  readonly vehicleSpeed: number;
  readonly windSpeed: number;
  readonly steps: number;
}

/**
 * Fills in and checks wind-averaging options.
 *
 * @param fn - calling function, for the message
 * @param options - vehicle speed (m/s), wind speed (m/s), steps
 * @returns the options with defaults
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity; `OUT_OF_RANGE` for V ≤ 0, V_w < 0, or steps not an even whole number ≥ 2
 * @example
 * resolveWindAveragingOptions('windAveragedDragCoefficient', {}); // { vehicleSpeed: 24.5872, windSpeed: 3.12928, steps: 720 }
 */
export function resolveWindAveragingOptions(fn: string, options: WindAveragingOptions): ResolvedWindAveragingOptions {
  const vehicleSpeed = requirePositive(fn, 'vehicle speed', options.vehicleSpeed ?? J1252_VEHICLE_SPEED, 'm/s');
  const windSpeed = requireNonNegative(fn, 'wind speed', options.windSpeed ?? J1252_WIND_SPEED, 'm/s');
  const steps = options.steps ?? WIND_AVERAGING_STEPS;
  if (!Number.isInteger(steps) || steps < 2 || steps % 2 !== 0) {
    throw new AeroInputError('OUT_OF_RANGE', `\`${fn}\` requires an even whole number of steps of at least 2 (Simpson's rule); got ${steps}`);
  }
  return { vehicleSpeed, windSpeed, steps };
}
