import { AeroInputError } from '../errors/aero-input-error';
import { relativeWind } from './relative-wind';
import { resolveWindAveragingOptions, type WindAveragingOptions } from './wind-averaging-options';

/**
 * Wind-averaged drag coefficient: the mean drag over all wind directions, equally likely, at one wind speed.
 *
 * C_D,wa = (1/π) ∫₀^π C_D(ψ(φ)) · (V_r(φ)/V)² dφ, with V_r² = V² + V_w² + 2·V·V_w·cos φ and
 * ψ = atan[V_w·sin φ/(V + V_w·cos φ)], integrated by composite Simpson's rule. With a constant C_D it equals
 * C_D·(1 + (V_w/V)²). Only 0…π is integrated, so the vehicle is taken as left–right symmetric.
 *
 * Source: SAE J1252 (wind-averaged drag, V = 55 mph, V_w = 7 mph — values from memory); Ingram 1978, "The wind-averaged
 * drag coefficient applied to heavy goods vehicles", TRRL SR392 (title from memory).
 *
 * @param dragCoefficientAtYaw - body-axis drag coefficient as a function of yaw angle ψ in rad (ψ ≥ 0 here)
 * @param options - vehicle speed (m/s, default 55 mph), wind speed (m/s, default 7 mph), Simpson steps (default 720)
 * @returns wind-averaged drag coefficient (dimensionless, on the same area as C_D(ψ))
 * @throws {AeroInputError} `NOT_FINITE` if C_D(ψ) returns NaN or ±Infinity (naming the yaw), or bad options
 * @example
 * windAveragedDragCoefficient(() => 0.5); // ≈ 0.508099 (= 0.5·(1 + (7/55)²))
 */
export function windAveragedDragCoefficient(dragCoefficientAtYaw: (yawAngle: number) => number, options: WindAveragingOptions = {}): number {
  const fn = 'windAveragedDragCoefficient';
  const { vehicleSpeed, windSpeed, steps } = resolveWindAveragingOptions(fn, options);
  const h = Math.PI / steps;
  let sum = 0;
  for (let i = 0; i <= steps; i++) {
    const windDirection = i * h;
    const { airspeed, yawAngle } = relativeWind({ groundSpeed: vehicleSpeed, windSpeed, windDirection });
    const dragCoefficient = dragCoefficientAtYaw(yawAngle);
    if (!Number.isFinite(dragCoefficient)) {
      throw new AeroInputError('NOT_FINITE', `\`${fn}\` requires a finite drag coefficient at every yaw; got ${dragCoefficient} at ψ = ${yawAngle} rad`);
    }
    const weight = i === 0 || i === steps ? 1 : i % 2 === 1 ? 4 : 2;
    sum += weight * dragCoefficient * (airspeed / vehicleSpeed) ** 2;
  }
  return ((h / 3) * sum) / Math.PI;
}
