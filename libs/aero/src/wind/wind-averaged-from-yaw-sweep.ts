import { AeroInputError } from '../errors/aero-input-error';
import { radiansToDegrees } from '../units/angles';
import { maximumYawAngle } from './maximum-yaw-angle';
import { windAveragedDragCoefficient } from './wind-averaged-drag-coefficient';
import { resolveWindAveragingOptions, type WindAveragingOptions } from './wind-averaging-options';
import { yawSweepInterpolator, type YawSweepPoint } from './yaw-sweep-interpolator';

/**
 * Wind-averaged drag coefficient from a measured yaw sweep.
 *
 * Interpolates the sweep linearly (see {@link yawSweepInterpolator}; one-sided sweeps are mirrored, two-sided ones
 * averaged side for side) and integrates it as {@link windAveragedDragCoefficient}. The sweep must reach the largest
 * yaw the integral meets, ψ_max = asin(V_w/V) (7.31° at 7 mph on 55 mph).
 *
 * Source: SAE J1252 (from memory); Ingram 1978, TRRL SR392.
 *
 * @param points - measured { yawAngle (rad), dragCoefficient } in any order
 * @param options - vehicle speed (m/s, default 55 mph), wind speed (m/s, default 7 mph), Simpson steps (default 720)
 * @returns wind-averaged drag coefficient (dimensionless)
 * @throws {AeroInputError} `NOT_COVERED` if the sweep stops short of ψ_max or does not include ψ = 0; `EMPTY_INPUT`,
 *   `NOT_FINITE` or `OUT_OF_RANGE` for bad points or options
 * @example
 * windAveragedFromYawSweep([{ yawAngle: 0, dragCoefficient: 0.5 }, { yawAngle: 0.2, dragCoefficient: 0.5 }]); // ≈ 0.508099
 */
export function windAveragedFromYawSweep(points: readonly YawSweepPoint[], options: WindAveragingOptions = {}): number {
  const fn = 'windAveragedFromYawSweep';
  const resolved = resolveWindAveragingOptions(fn, options);
  const sweep = yawSweepInterpolator(points);
  const needed = maximumYawAngle(resolved.vehicleSpeed, resolved.windSpeed);
  // A relative margin of 1e-12 absorbs round-off between asin and the atan2 of the quadrature nodes.
  if (sweep.coveredYawAngle < needed * (1 - 1e-12)) {
    const covered = sweep.coveredYawAngle < 0 ? 'no range starting at 0°' : `0° to ${radiansToDegrees(sweep.coveredYawAngle).toFixed(2)}°`;
    throw new AeroInputError(
      'NOT_COVERED',
      `\`${fn}\` requires a yaw sweep from 0° to at least ${radiansToDegrees(needed).toFixed(2)}° for a ${resolved.windSpeed} m/s wind on ${resolved.vehicleSpeed} m/s; the sweep covers ${covered}${sweep.mirrored ? '' : ' on both sides'}`,
    );
  }
  // Clamp the yaw to the covered range: the quadrature's last node can exceed ψ_max by round-off.
  const limit = sweep.coveredYawAngle;
  return windAveragedDragCoefficient((yaw) => sweep.dragCoefficientAtYaw(Math.min(Math.abs(yaw), limit)), resolved);
}
