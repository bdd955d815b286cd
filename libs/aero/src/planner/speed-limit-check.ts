import { requirePositive } from '../errors/require-number';
import type { FitCheck } from './fit-check';

/**
 * Tunnel speed check: a planned speed passes at or below the tunnel's maximum and fails above it.
 *
 * Source: definition.
 *
 * @param speed planned speed, m/s
 * @param maxSpeed tunnel maximum speed, m/s
 * @returns check `speed-<speed>`, value = speed / maxSpeed
 * @throws {AeroInputError} `NOT_FINITE` or `OUT_OF_RANGE` when an input is not finite and positive
 * @example speedLimitCheck(40, 50).status // 'pass'
 */
export function speedLimitCheck(speed: number, maxSpeed: number): FitCheck {
  requirePositive('speedLimitCheck', 'planned speed', speed, 'm/s');
  requirePositive('speedLimitCheck', 'maximum speed', maxSpeed, 'm/s');
  const id = `speed-${speed}`;
  if (speed > maxSpeed) {
    return { id, status: 'fail', value: speed / maxSpeed, reason: `${speed} m/s is above the tunnel maximum of ${maxSpeed} m/s.` };
  }
  return { id, status: 'pass', value: speed / maxSpeed, reason: `${speed} m/s is within the tunnel maximum of ${maxSpeed} m/s.` };
}
