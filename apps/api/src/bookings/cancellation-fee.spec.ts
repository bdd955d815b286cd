import { describe, expect, it } from 'vitest';
import { percentOfMinor } from './cancellation-fee';

describe('percentOfMinor', () => {
  it('takes a whole-number share in integer minor units, rounding half up', () => {
    expect(percentOfMinor(193650, 50)).toBe(96825);
    expect(percentOfMinor(101, 50)).toBe(51);
    expect(percentOfMinor(99, 33)).toBe(33);
    expect(percentOfMinor(0, 50)).toBe(0);
    expect(percentOfMinor(150000, 0)).toBe(0);
    expect(percentOfMinor(150000, 100)).toBe(150000);
  });

  it('keeps large totals exact', () => {
    expect(percentOfMinor(9_000_000_000_01, 25)).toBe(2_250_000_000_00);
  });
});
