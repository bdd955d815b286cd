import { AeroInputError } from '../errors';
import { requirePositive } from '../errors/require-number';
import { fullScaleDragAndPower } from '../wind';
import { PLANNER_CAUTION } from './planner-caution';

/** Inputs of {@link headTailPowerSeries}. */
export interface HeadTailSeriesInput {
  /** Drag area C_D·A, m². */
  dragArea: number;
  /** Air density, kg/m³. */
  density: number;
  /** Vehicle speed over the ground, m/s. */
  groundSpeed: number;
  /** Wind speeds to chart, m/s, each ≥ 0. */
  windSpeeds: readonly number[];
}

/** Drag and power for one wind case. */
export interface WindCase {
  /** Air speed relative to the vehicle, m/s. */
  airspeed: number;
  drag: number;
  power: number;
}

/** One chart point: the same wind speed dead ahead and dead astern. */
export interface HeadTailPoint {
  windSpeed: number;
  headwind: WindCase;
  /**
   * Null when the tailwind is at least the ground speed: the vehicle then sees still air or air from behind, where a
   * constant C_D·A does not apply.
   */
  tailwind: WindCase | null;
}

/** Result of {@link headTailPowerSeries}. */
export interface HeadTailSeries {
  points: HeadTailPoint[];
  caution: string;
}

/**
 * Head- versus tail-wind drag and power across wind speeds, for a chart: at each wind speed the wind is taken dead
 * ahead (direction 0) and dead astern (direction π); air speed is ground speed ± wind speed, drag ½ρV_r²·C_D·A and
 * power drag × ground speed.
 *
 * Source: `wind/fullScaleDragAndPower` (definitions), applied at both directions.
 *
 * @param input drag area (m²), density (kg/m³), ground speed (m/s), wind speeds (m/s)
 * @returns one point per wind speed, and the planner caution
 * @throws {AeroInputError} `EMPTY_INPUT` with no wind speeds; `NOT_FINITE` or `OUT_OF_RANGE` for bad numbers
 * @example headTailPowerSeries({ dragArea: 0.3168, density: 1.225, groundSpeed: 10, windSpeeds: [0, 4] }).points[1].tailwind?.power // ≈ 69.9 W
 */
export function headTailPowerSeries(input: HeadTailSeriesInput): HeadTailSeries {
  const fn = 'headTailPowerSeries';
  requirePositive(fn, 'ground speed', input.groundSpeed, 'm/s');
  if (input.windSpeeds.length === 0) throw new AeroInputError('EMPTY_INPUT', `\`${fn}\` requires at least one wind speed`);
  const at = (windSpeed: number, windDirection: number): WindCase => {
    const { airspeed, drag, power } = fullScaleDragAndPower({ ...input, windSpeed, windDirection });
    return { airspeed, drag, power };
  };
  const points = input.windSpeeds.map((windSpeed) => ({
    windSpeed,
    headwind: at(windSpeed, 0),
    tailwind: windSpeed >= input.groundSpeed ? null : at(windSpeed, Math.PI),
  }));
  return { points, caution: PLANNER_CAUTION };
}
