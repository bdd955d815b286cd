import { fullScaleDragAndPower, type FullScaleDragAndPower, type FullScaleDragInput } from '../wind';
import { PLANNER_CAUTION } from './planner-caution';

/** Result of {@link fullScalePower}: the wind module's drag and power, with the planner caution. */
export interface FullScalePowerResult extends FullScaleDragAndPower {
  caution: string;
}

/**
 * Full-scale aerodynamic drag and power of a vehicle moving through wind, with a constant drag area:
 * relative air speed by vector addition of motion and wind, drag = ½ρV_r²·C_D·A, power = drag × ground speed.
 *
 * Source: `wind/fullScaleDragAndPower` (definitions D = q·C_D·A and P = D·V; relative wind by vector addition).
 *
 * @param input drag area C_D·A (m²), density (kg/m³), ground speed (m/s), wind speed (m/s),
 *   wind direction (rad; 0 = headwind, π = tailwind)
 * @returns air speed (m/s), yaw angle (rad), drag (N), power (W) and the planner caution
 * @throws {AeroInputError} as `fullScaleDragAndPower`: bad numbers, or air reaching the vehicle from behind
 * @example fullScalePower({ dragArea: 0.3168, density: 1.225, groundSpeed: 10, windSpeed: 4, windDirection: 0 }).power // ≈ 380.3 W
 */
export function fullScalePower(input: FullScaleDragInput): FullScalePowerResult {
  return { ...fullScaleDragAndPower(input), caution: PLANNER_CAUTION };
}
