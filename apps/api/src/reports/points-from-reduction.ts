import type { CoefficientValue, PointResult } from '@tunnelwright/aero';
import type { MeasuredValue, ResultPoint } from './result-sheet-data';

const KELVIN_OFFSET = 273.15;

function measured(c: CoefficientValue): MeasuredValue {
  if (!c.uncertainty) throw new Error('A certified sheet reports corrected coefficients only, each with its uncertainty');
  return { value: c.value, expandedUncertainty: c.uncertainty.expandedUncertainty };
}

/**
 * Turns reduced points into sheet points: corrected coefficients with U (k = 2), the air state in sheet units
 * (°C, %), and the drag area C_D·S with U(C_D·S) taken as S·U(C_D) (which keeps the reference-area term, so errs high).
 *
 * @param points - points of a `ReductionResult`
 * @param excluded - point numbers left out of the sheet (listed with their reasons elsewhere)
 */
export function pointsFromReduction(points: readonly PointResult[], excluded: ReadonlySet<number> = new Set()): ResultPoint[] {
  return points
    .filter((p) => !excluded.has(p.point))
    .map((p) => {
      const drag = measured(p.corrected.dragCoefficient);
      const area = p.corrected.dragCoefficient.referenceArea;
      return {
        point: p.point,
        yaw: p.yaw,
        conditions: {
          barometricPressure: p.channels.barometricPressure.mean,
          temperature: p.channels.temperature.mean - KELVIN_OFFSET,
          relativeHumidity: p.channels.relativeHumidity.mean * 100,
          density: p.density,
          speed: p.correctedSpeed,
          dynamicPressure: p.correctedDynamicPressure,
          reynoldsNumber: p.reynoldsNumber,
        },
        dragCoefficient: drag,
        liftCoefficient: measured(p.corrected.liftCoefficient),
        sideForceCoefficient: measured(p.corrected.sideForceCoefficient),
        rollingMomentCoefficient: measured(p.corrected.rollingMomentCoefficient),
        pitchingMomentCoefficient: measured(p.corrected.pitchingMomentCoefficient),
        yawingMomentCoefficient: measured(p.corrected.yawingMomentCoefficient),
        dragArea: { value: p.dragArea, expandedUncertainty: area * drag.expandedUncertainty },
      };
    });
}
