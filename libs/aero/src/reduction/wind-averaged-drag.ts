import type { ReductionConfig } from '../config';
import { degreesToRadians } from '../units';
import { windAveragedFromYawSweep } from '../wind';
import type { PointResult, ReductionResult } from './reduction-result';

/**
 * Wind-averaged drag coefficient of the run's yaw sweep, SAE J1252 (uniform wind heading), when configured.
 * Uses the corrected body-axis (axial) force coefficient of each point, as J1252 does.
 *
 * @param points - the reduced points
 * @param config - the configuration (its `windAveraging`)
 * @returns the averaged coefficient with the speeds used, or undefined when not configured
 * @throws {AeroInputError} `NOT_COVERED` when the sweep does not reach the yaw the wind needs
 */
export function windAveragedDrag(points: readonly PointResult[], config: ReductionConfig): ReductionResult['windAveraged'] {
  const options = config.windAveraging;
  if (!options) return undefined;
  const sweep = points.map((p) => ({ yawAngle: degreesToRadians(p.yaw), dragCoefficient: p.corrected.axialForceCoefficient.value }));
  const dragCoefficient = windAveragedFromYawSweep(sweep, { vehicleSpeed: options.vehicleSpeed, windSpeed: options.windSpeed });
  return { dragCoefficient, vehicleSpeed: options.vehicleSpeed, windSpeed: options.windSpeed, method: 'SAE J1252 (uniform wind heading), body-axis C_D' };
}
