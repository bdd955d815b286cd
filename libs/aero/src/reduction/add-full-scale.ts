import { sutherlandViscosity } from '../air';
import type { ReductionConfig } from '../config';
import { reynoldsNumber } from '../flow';
import { degreesToRadians, radiansToDegrees } from '../units';
import { fullScaleDragAndPower } from '../wind';
import type { PointResult } from './reduction-result';

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
