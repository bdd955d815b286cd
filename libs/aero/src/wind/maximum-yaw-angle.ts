import { requireNonNegative, requirePositive } from '../errors/require-number';

/**
 * Largest yaw angle a vehicle meets over all wind directions at one wind speed.
 *
 * ψ_max = asin(V_w/V) for V_w < V; π/2 for V_w = V (approached as the relative air vanishes); π for V_w > V.
 *
 * Source: geometry of the relative-wind triangle, ψ = atan[V_w·sin φ/(V + V_w·cos φ)] (SAE J1252 form — from memory).
 *
 * @param vehicleSpeed - vehicle speed V, m/s (> 0)
 * @param windSpeed - wind speed V_w, m/s (≥ 0)
 * @returns ψ_max, rad
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity; `OUT_OF_RANGE` for V ≤ 0 or V_w < 0
 * @example
 * maximumYawAngle(55, 7); // ≈ 0.12762 rad (7.31°)
 */
export function maximumYawAngle(vehicleSpeed: number, windSpeed: number): number {
  const v = requirePositive('maximumYawAngle', 'vehicle speed', vehicleSpeed, 'm/s');
  const w = requireNonNegative('maximumYawAngle', 'wind speed', windSpeed, 'm/s');
  if (w < v) return Math.asin(w / v);
  return w === v ? Math.PI / 2 : Math.PI;
}
