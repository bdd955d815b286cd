import { AeroInputError } from '../errors/aero-input-error';
import { requirePositive } from '../errors/require-number';
import { relativeWind, type RelativeWind, type RelativeWindInput } from './relative-wind';

/** Inputs of {@link fullScaleDragAndPower}. */
export interface FullScaleDragInput extends RelativeWindInput {
  /** Drag area C_D·A of the full-scale vehicle, m². */
  readonly dragArea: number;
  /** Air density ρ, kg/m³. */
  readonly density: number;
}

/** Road-load estimate for one wind case. */
export interface FullScaleDragAndPower extends RelativeWind {
  /** Aerodynamic drag D = ½·ρ·V_r²·C_D·A, N. */
  readonly drag: number;
  /** Power to overcome it P = D·V_ground, W. */
  readonly power: number;
}

/**
 * Aerodynamic drag and power of a full-scale vehicle in wind, with a constant drag area.
 *
 * D = ½·ρ·V_r²·(C_D·A); P = D·V_ground, where V_r comes from {@link relativeWind}. A yaw-dependent C_D·A is the
 * caller's to apply. These are estimates from tunnel data, not design values: any design load belongs to a
 * licensed engineer under the governing code.
 *
 * Source: definitions q = ½ρV², D = q·C_D·A, P = D·V (Hucho, Aerodynamics of Road Vehicles, ch. 1 — from memory);
 * relative wind as 40 CFR 1037.528.
 *
 * @param input - drag area (m²), density (kg/m³), ground speed (m/s), wind speed (m/s), wind direction (rad)
 * @returns airspeed (m/s), yaw angle (rad), drag (N) and power (W)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity; `OUT_OF_RANGE` for C_D·A ≤ 0, ρ ≤ 0, a negative
 *   speed, or air reaching the vehicle from behind (|ψ| ≥ 90°), where a constant drag area does not apply
 * @example
 * fullScaleDragAndPower({ dragArea: 0.25, density: 1.2, groundSpeed: 10, windSpeed: 3, windDirection: 0 });
 * // { airspeed: 13, yawAngle: 0, drag: 25.35, power: 253.5 }
 */
export function fullScaleDragAndPower(input: FullScaleDragInput): FullScaleDragAndPower {
  const fn = 'fullScaleDragAndPower';
  const dragArea = requirePositive(fn, 'drag area', input.dragArea, 'm²');
  const density = requirePositive(fn, 'density', input.density, 'kg/m³');
  const wind = relativeWind(input);
  if (wind.airspeed > 0 && Math.abs(wind.yawAngle) >= Math.PI / 2) {
    throw new AeroInputError(
      'OUT_OF_RANGE',
      `\`${fn}\` requires air approaching from ahead (|yaw| < 90°); got a ${input.windSpeed} m/s wind overtaking a ${input.groundSpeed} m/s vehicle`,
    );
  }
  const drag = 0.5 * density * wind.airspeed * wind.airspeed * dragArea;
  return { ...wind, drag, power: drag * input.groundSpeed };
}
