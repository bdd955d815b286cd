import { sutherlandViscosity } from '../air';
import type { ReductionConfig } from '../config';
import { reynoldsNumber } from '../flow';
import { degreesToRadians, radiansToDegrees } from '../units';
import { fullScaleDragAndPower, windAveragedFromYawSweep } from '../wind';
import type { PointResult, ReductionResult } from './reduction-result';

/**
 * Adds the full-scale drag and power to a point when the configuration asks for them.
 *
 * Full-scale drag area = C_Dc·λ²·S (λ = full-scale length / model length); D = ½·ρ·V_r²·C_D·A and P = D·V_ground
 * at the configured ground speed and wind; the Re ratio is Re_model / Re_full with Re_full = ρ·V_r·λL/μ(T).
 * Each point's own C_D is used, so read the point whose yaw matches the relative-wind yaw reported.
 * Sources: Barlow, Rae & Pope 1999 ch. 1 (scaling, from memory); SAE J1252 for the wind vector (from memory).
 *
 * @param point - a reduced point
 * @param config - the configuration (its `fullScale` and `article.scale`)
 * @returns the point, with `fullScale` set when configured
 * @throws {AeroInputError} from `fullScaleDragAndPower` for impossible winds or a non-positive drag area
 */
export function addFullScale(point: PointResult, config: ReductionConfig): PointResult {
  const fullScale = config.fullScale;
  if (!fullScale) return point;
  const { scale, referenceArea, referenceLength } = config.article;
  const dragArea = point.corrected.dragCoefficient.value * referenceArea * scale * scale;
  const result = fullScaleDragAndPower({
    dragArea,
    density: fullScale.density,
    groundSpeed: fullScale.groundSpeed,
    windSpeed: fullScale.windSpeed,
    windDirection: degreesToRadians(fullScale.windDirection),
  });
  const fullReynolds = reynoldsNumber(fullScale.density, result.airspeed, referenceLength * scale, sutherlandViscosity(fullScale.temperature));
  return {
    ...point,
    fullScale: {
      dragArea,
      airSpeed: result.airspeed,
      yawAngle: radiansToDegrees(result.yawAngle),
      drag: result.drag,
      power: result.power,
      reynoldsNumberRatio: point.reynoldsNumber / fullReynolds,
    },
  };
}

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
