import { requireNonNegative, requirePositive } from '../errors/require-number';
import type { FitCheck } from './fit-check';
import { CAPACITY_FAIL_FRACTION, CAPACITY_WARN_FRACTION } from './fit-thresholds';

/** Inputs of {@link loadCheck}. */
export interface LoadInput {
  /** Planned tunnel speed, m/s (for the id and text). */
  speed: number;
  /** Predicted load including the yaw margin, N. */
  load: number;
  /** Balance capacity on the same component, N. */
  capacity: number;
  /** Balance component name, e.g. `drag`. */
  component: string;
}

/**
 * Balance-capacity check: predicted load as a fraction of capacity. Passes below 80 %; warns from 80 % inclusive up
 * to 100 % inclusive; fails above 100 %.
 *
 * Source: thresholds are our choice (common practice); the fraction is a definition.
 *
 * @param input speed (m/s), load (N), capacity (N), component name
 * @returns check `load-<component>-<speed>`, value = load / capacity
 * @throws {AeroInputError} `NOT_FINITE` or `OUT_OF_RANGE` when the capacity is not positive or the load is negative
 * @example loadCheck({ speed: 30, load: 50, capacity: 100, component: 'drag' }).status // 'pass'
 */
export function loadCheck(input: LoadInput): FitCheck {
  const { speed, component } = input;
  const capacity = requirePositive('loadCheck', `${component} capacity`, input.capacity, 'N');
  const load = requireNonNegative('loadCheck', `${component} load`, input.load, 'N');
  const fraction = load / capacity;
  const id = `load-${component}-${speed}`;
  const numbers = `${load.toPrecision(4)} N is ${(fraction * 100).toFixed(1)} % of the ${capacity.toPrecision(4)} N ${component} capacity at ${speed} m/s`;
  if (fraction > CAPACITY_FAIL_FRACTION) {
    return { id, status: 'fail', value: fraction, reason: `${numbers}: above capacity; lower the speed or the scale.` };
  }
  if (fraction >= CAPACITY_WARN_FRACTION) {
    return { id, status: 'warn', value: fraction, reason: `${numbers}: at or above ${CAPACITY_WARN_FRACTION * 100} % of capacity.` };
  }
  return { id, status: 'pass', value: fraction, reason: `${numbers}.` };
}
