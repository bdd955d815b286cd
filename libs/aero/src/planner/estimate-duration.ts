import { AeroInputError } from '../errors';
import { requireNonNegative } from '../errors/require-number';
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
 * @throws {AeroInputError} `NOT_FINITE` or `OUT_OF_RANGE` when a count is not a non-negative integer or a time is negative
 * @example estimateDuration({ points: 120, dwellSeconds: 30, configurationChanges: 4, changeMinutes: 15, setupMinutes: 60 }).hours // 3
 */
export function estimateDuration(input: DurationInput): DurationEstimate {
  const { points, dwellSeconds, configurationChanges, changeMinutes, setupMinutes } = input;
  for (const [name, value] of [
    ['points', points],
    ['configurationChanges', configurationChanges],
  ] as const) {
    requireNonNegative('estimateDuration', name, value, '');
    if (!Number.isInteger(value)) {
      throw new AeroInputError('OUT_OF_RANGE', `\`estimateDuration\` requires a whole number of ${name}; got ${value}`);
    }
  }
  for (const [name, value] of [
    ['dwellSeconds', dwellSeconds],
    ['changeMinutes', changeMinutes],
    ['setupMinutes', setupMinutes],
  ] as const) {
    requireNonNegative('estimateDuration', name, value, name === 'dwellSeconds' ? 's' : 'min');
  }
  const pointHours = (points * dwellSeconds) / 3600;
  const changeHours = (configurationChanges * changeMinutes) / 60;
  const setupHours = setupMinutes / 60;
  return { hours: pointHours + changeHours + setupHours, pointHours, changeHours, setupHours, caution: PLANNER_CAUTION };
}
