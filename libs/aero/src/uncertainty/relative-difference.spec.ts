import { describe, expect, it } from 'vitest';
import { AeroInputError } from '../errors/aero-input-error';
import { relativeDifference } from './relative-difference';

describe('relativeDifference', () => {
  it('is signed and relative to |reference|', () => {
    // Definition: (1.198866 − 1.199314)/1.199314 = −3.7355e-4 (ideal-gas vs CIPM-2007 density, Picard et al. 2008).
    expect(relativeDifference(1.198866, 1.199314)).toBeCloseTo(-3.7355e-4, 8);
    expect(relativeDifference(-1.1, -1)).toBeCloseTo(-0.1, 15);
    expect(relativeDifference(0, 5)).toBe(-1);
  });

  it('rejects NaN, infinity and a zero reference', () => {
    expect(() => relativeDifference(Number.NaN, 1)).toThrow(AeroInputError);
    expect(() => relativeDifference(1, Number.POSITIVE_INFINITY)).toThrow(/finite reference/);
    expect(() => relativeDifference(1, 0)).toThrow('`relativeDifference` requires a non-zero reference; got 0');
  });
});
