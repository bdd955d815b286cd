import { describe, expect, it } from 'vitest';
import { FOOT, HORSEPOWER, MILE_PER_HOUR, POUND_FORCE } from './nist-constants';

describe('exact NIST SP 811 constants used by the reduction', () => {
  it('60 mph = 26.8224 m/s = 88 ft/s', () => {
    // NIST SP 811 (2008) App. B: mph = 0.44704 m/s and ft/s = 0.3048 m/s, both exact.
    expect(Math.abs((60 * MILE_PER_HOUR) / 26.8224 - 1)).toBeLessThan(1e-15);
    expect(Math.abs((60 * MILE_PER_HOUR) / FOOT / 88 - 1)).toBeLessThan(1e-15);
  });

  it('1 lbf = 4.4482216152605 N and 1 hp = 745.69987158 W', () => {
    // NIST SP 811 (2008) App. B: lbf = 0.45359237 kg × 9.80665 m/s² = 4.4482216152605 N (exact);
    // hp (550 ft·lbf/s) = 745.69987158 W; both ±1e-9 relative.
    expect(Math.abs(POUND_FORCE / 4.4482216152605 - 1)).toBeLessThan(1e-9);
    expect(Math.abs(HORSEPOWER / 745.69987158 - 1)).toBeLessThan(1e-9);
  });
});
