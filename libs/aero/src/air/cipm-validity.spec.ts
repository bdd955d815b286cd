import { describe, expect, it } from 'vitest';
import { cipmValidity, isWithinCipmValidity } from './cipm-validity';

describe('isWithinCipmValidity', () => {
  it('uses 600–1100 hPa and 15–27 °C', () => {
    // CIPM-2007, Picard et al. 2008, Metrologia 45:149: valid 600–1100 hPa, 15–27 °C.
    expect(cipmValidity.minPressure).toBe(60_000);
    expect(cipmValidity.maxPressure).toBe(110_000);
    expect(cipmValidity.minTemperature).toBeCloseTo(288.15, 10);
    expect(cipmValidity.maxTemperature).toBeCloseTo(300.15, 10);
  });

  it('accepts room conditions and the bounds', () => {
    expect(isWithinCipmValidity({ pressure: 101325, temperature: 293.15 })).toBe(true);
    expect(isWithinCipmValidity({ pressure: 60_000, temperature: cipmValidity.minTemperature })).toBe(true);
    expect(isWithinCipmValidity({ pressure: 110_000, temperature: cipmValidity.maxTemperature })).toBe(true);
  });

  it('flags a hot tunnel and a high-altitude lab', () => {
    expect(isWithinCipmValidity({ pressure: 101325, temperature: 273.15 + 35 })).toBe(false);
    expect(isWithinCipmValidity({ pressure: 55_000, temperature: 293.15 })).toBe(false);
  });

  it('returns false for NaN, infinity and zero', () => {
    expect(isWithinCipmValidity({ pressure: Number.NaN, temperature: 293.15 })).toBe(false);
    expect(isWithinCipmValidity({ pressure: 101325, temperature: Number.POSITIVE_INFINITY })).toBe(false);
    expect(isWithinCipmValidity({ pressure: 0, temperature: 293.15 })).toBe(false);
  });
});
