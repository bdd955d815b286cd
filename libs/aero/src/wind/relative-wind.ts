import { requireFinite, requireNonNegative } from '../errors/require-number';

/** Inputs of {@link relativeWind}. */
export interface RelativeWindInput {
  /** Vehicle speed over the ground V, m/s, ≥ 0. */
  readonly groundSpeed: number;
  /** Wind speed over the ground V_w, m/s, ≥ 0. */
  readonly windSpeed: number;
  /** Direction the wind comes from, relative to the vehicle heading φ, rad: 0 = headwind, π = tailwind. */
  readonly windDirection: number;
}

/** The air seen by the vehicle. */
export interface RelativeWind {
  /** Airspeed V_r, m/s. */
  readonly airspeed: number;
  /** Yaw angle ψ of the relative air, rad; it has the sign of sin φ, and is 0 with no air motion. */
  readonly yawAngle: number;
}

/**
 * Relative wind on a moving vehicle, by vector addition of its motion and the wind.
 *
 * V_r² = V² + V_w² + 2·V·V_w·cos φ; ψ = atan2(V_w·sin φ, V + V_w·cos φ).
 *
 * Source: 40 CFR 1037.528 (coastdown air-speed and yaw from wind, worked example 7.1 mph at 47° on 64.9 mph →
 * 69.93 mph, 4.26°); SAE J1252 and Ingram 1978, TRRL SR392 (wind-averaged drag).
 *
 * @param input - ground speed V (m/s), wind speed V_w (m/s), wind direction φ (rad, 0 = headwind)
 * @returns airspeed V_r (m/s) and yaw angle ψ (rad)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for a negative speed
 * @example
 * relativeWind({ groundSpeed: 10, windSpeed: 3, windDirection: 0 }); // { airspeed: 13, yawAngle: 0 }
 */
export function relativeWind(input: RelativeWindInput): RelativeWind {
  const fn = 'relativeWind';
  const v = requireNonNegative(fn, 'ground speed', input.groundSpeed, 'm/s');
  const w = requireNonNegative(fn, 'wind speed', input.windSpeed, 'm/s');
  const phi = requireFinite(fn, 'wind direction', input.windDirection, 'rad');
  const axial = v + w * Math.cos(phi);
  const lateral = w * Math.sin(phi);
  return { airspeed: Math.hypot(axial, lateral), yawAngle: Math.atan2(lateral, axial) };
}
