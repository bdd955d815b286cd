import { PLANNER_CAUTION } from './planner-caution';

/** Inputs of {@link estimateDuration}. */
export interface DurationInput {
  /** Test points to take (speed × attitude combinations), count. */
  points: number;
  /** Time on condition per point, including settling, s. */
  dwellSeconds: number;
  /** Model configuration changes during the test, count. */
  configurationChanges: number;
  /** Time per configuration change, min. */
  changeMinutes: number;
  /** Installation and checkout before the first point, min. */
  setupMinutes: number;
}

/** Tunnel occupancy estimate, h, with its parts. */
export interface DurationEstimate {
  hours: number;
  pointHours: number;
  changeHours: number;
  setupHours: number;
  caution: string;
}

/**
 * Tunnel occupancy: points times dwell, plus configuration changes times change time, plus setup, in hours.
 *
 * Source: definition (sum of the scheduled activities); the inputs are the lab's own figures.
 *
 * @param input counts, dwell in seconds, change and setup in minutes
 * @returns hours with the breakdown
 * @throws {RangeError} when a count is not a non-negative integer or a time is negative or not finite
 * @example estimateDuration({ points: 120, dwellSeconds: 30, configurationChanges: 4, changeMinutes: 15, setupMinutes: 60 }).hours // 3
 */
export function estimateDuration(input: DurationInput): DurationEstimate {
  const { points, dwellSeconds, configurationChanges, changeMinutes, setupMinutes } = input;
  for (const [name, value] of [
    ['points', points],
    ['configurationChanges', configurationChanges],
  ] as const) {
    if (!Number.isInteger(value) || value < 0) {
      throw new RangeError(`estimateDuration requires ${name} to be a non-negative integer (got ${value})`);
    }
  }
  for (const [name, value] of [
    ['dwellSeconds', dwellSeconds],
    ['changeMinutes', changeMinutes],
    ['setupMinutes', setupMinutes],
  ] as const) {
    if (!Number.isFinite(value) || value < 0) {
      throw new RangeError(`estimateDuration requires ${name} to be finite and non-negative (got ${value})`);
    }
  }
  const pointHours = (points * dwellSeconds) / 3600;
  const changeHours = (configurationChanges * changeMinutes) / 60;
  const setupHours = setupMinutes / 60;
  return { hours: pointHours + changeHours + setupHours, pointHours, changeHours, setupHours, caution: PLANNER_CAUTION };
}
