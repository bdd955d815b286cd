import { requirePositive } from '../errors/require-number';
import { machNumber } from '../flow';
import type { FitCheck } from './fit-check';
import { MACH_FAIL, MACH_WARN } from './fit-thresholds';

/**
 * Compressibility check at the highest planned speed: M = V / a. Passes at M ≤ 0.3; warns above 0.3 up to 0.4
 * inclusive; fails above 0.4. The planner's loads are incompressible (q = ½ρV²); the isentropic density ratio
 * (1 + 0.2 M²)^2.5 is 1.046 at M = 0.3 and 1.082 at M = 0.4.
 *
 * Source: M = 0.3 incompressibility limit, common practice; M = 0.4 fail limit, our choice.
 *
 * @param speed highest planned speed, m/s
 * @param speedOfSound speed of sound in the test section, m/s
 * @returns check `mach`, value = Mach number
 * @throws {AeroInputError} `NOT_FINITE` or `OUT_OF_RANGE` when an input is not finite and positive
 * @example machCheck(68, 340).status // 'pass' (M = 0.2)
 */
export function machCheck(speed: number, speedOfSound: number): FitCheck {
  requirePositive('machCheck', 'speed', speed, 'm/s');
  requirePositive('machCheck', 'speed of sound', speedOfSound, 'm/s');
  const mach = machNumber(speed, speedOfSound);
  const at = `M = ${mach.toFixed(3)} at ${speed} m/s`;
  if (mach > MACH_FAIL) {
    return {
      id: 'mach',
      status: 'fail',
      value: mach,
      reason: `${at} is above ${MACH_FAIL}: density changes of 8 % or more make incompressible loads and corrections unreliable.`,
    };
  }
  if (mach > MACH_WARN) {
    return {
      id: 'mach',
      status: 'warn',
      value: mach,
      reason: `${at} is above ${MACH_WARN}: compressibility (about 5–8 % density change) should be corrected for.`,
    };
  }
  return { id: 'mach', status: 'pass', value: mach, reason: `${at} is at or below ${MACH_WARN}: incompressible flow assumed.` };
}
