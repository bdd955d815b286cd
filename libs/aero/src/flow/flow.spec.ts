import { describe, expect, it } from 'vitest';
import { AeroInputError } from '../errors/aero-input-error';
import { MILE_PER_HOUR, FOOT } from '../units/nist-constants';
import { dynamicPressure } from './dynamic-pressure';
import { machNumber } from './mach-number';
import { reynoldsNumber } from './reynolds-number';
import { speedFromDynamicPressure } from './speed-from-dynamic-pressure';

describe('dynamicPressure', () => {
  it('gives 551.25 Pa for ρ 1.225 kg/m³ and 30 m/s', () => {
    // Definition q = ½ρV² (Barlow, Rae & Pope 1999, ch. 1): 0.5 × 1.225 × 900 = 551.25 Pa, exact.
    expect(dynamicPressure(1.225, 30)).toBe(551.25);
  });

  it('converts 60 mph to 26.8224 m/s = 88 ft/s before use', () => {
    // NIST SP 811 App. B: 1 mph = 0.44704 m/s and 1 ft/s = 0.3048 m/s, both exact; 60 mph = 88 ft/s.
    expect(60 * MILE_PER_HOUR).toBeCloseTo(26.8224, 12);
    expect((60 * MILE_PER_HOUR) / FOOT).toBeCloseTo(88, 12);
    // q at 26.8224 m/s, ρ 1.225 (definition): 0.5 × 1.225 × 26.8224² = 440.658… Pa.
    expect(Math.abs(dynamicPressure(1.225, 60 * MILE_PER_HOUR) / (0.5 * 1.225 * 26.8224 ** 2) - 1)).toBeLessThan(1e-14);
  });

  it('is zero with no wind', () => {
    expect(dynamicPressure(1.2, 0)).toBe(0);
  });

  it('rejects NaN, infinity, zero density and negative speed', () => {
    expect(() => dynamicPressure(Number.NaN, 30)).toThrow(AeroInputError);
    expect(() => dynamicPressure(1.2, Number.POSITIVE_INFINITY)).toThrow(/finite speed/);
    expect(() => dynamicPressure(0, 30)).toThrow(/`dynamicPressure` requires a positive density; got 0 kg\/m³/);
    expect(() => dynamicPressure(1.2, -1)).toThrow(/non-negative speed/);
  });
});

describe('speedFromDynamicPressure', () => {
  it('inverts q = ½ρV²: 551.25 Pa at 1.225 kg/m³ → 30 m/s', () => {
    // Definition (Barlow, Rae & Pope 1999, ch. 1): √(2 × 551.25/1.225) = 30 m/s, to 1e-15 relative.
    expect(Math.abs(speedFromDynamicPressure(551.25, 1.225) / 30 - 1)).toBeLessThan(1e-15);
  });

  it('says the wind is off for zero or negative q', () => {
    expect(() => speedFromDynamicPressure(0, 1.2)).toThrow('`speedFromDynamicPressure` requires a positive dynamic pressure; got 0 Pa (is the wind on?)');
    expect(() => speedFromDynamicPressure(-2, 1.2)).toThrow(expect.objectContaining({ code: 'ZERO_WIND' }));
  });

  it('rejects NaN and infinity', () => {
    expect(() => speedFromDynamicPressure(Number.NaN, 1.2)).toThrow(expect.objectContaining({ code: 'NOT_FINITE' }));
    expect(() => speedFromDynamicPressure(500, Number.POSITIVE_INFINITY)).toThrow(/finite density/);
    expect(() => speedFromDynamicPressure(500, 0)).toThrow(/positive density/);
  });
});

describe('reynoldsNumber', () => {
  it('gives 2.053761e6 for ρ 1.225, 30 m/s, L 1 m, μ 1.7894e-5', () => {
    // Definition Re = ρVL/μ: 1.225 × 30 × 1 / 1.7894e-5 = 2.053761e6, ±1e-6 relative.
    expect(Math.abs(reynoldsNumber(1.225, 30, 1, 1.7894e-5) / 2.053761e6 - 1)).toBeLessThan(1e-6);
  });

  it('is zero with no wind', () => {
    expect(reynoldsNumber(1.2, 0, 1, 1.8e-5)).toBe(0);
  });

  it('rejects NaN, infinity and zero length or viscosity', () => {
    expect(() => reynoldsNumber(Number.NaN, 30, 1, 1.8e-5)).toThrow(AeroInputError);
    expect(() => reynoldsNumber(1.2, 30, Number.POSITIVE_INFINITY, 1.8e-5)).toThrow(/finite reference length/);
    expect(() => reynoldsNumber(1.2, 30, 0, 1.8e-5)).toThrow(/positive reference length; got 0 m/);
    expect(() => reynoldsNumber(1.2, 30, 1, 0)).toThrow(/positive viscosity/);
  });
});

describe('machNumber', () => {
  it('gives 0.1 for 34.0294 m/s at a0 = 340.294 m/s', () => {
    // Definition M = V/a with a0 = 340.294 m/s (US Standard Atmosphere 1976 — from memory).
    expect(Math.abs(machNumber(34.0294, 340.294) / 0.1 - 1)).toBeLessThan(1e-15);
  });

  it('rejects NaN, infinity and zero speed of sound', () => {
    expect(() => machNumber(Number.NaN, 340)).toThrow(AeroInputError);
    expect(() => machNumber(30, Number.POSITIVE_INFINITY)).toThrow(/finite speed of sound/);
    expect(() => machNumber(30, 0)).toThrow(/positive speed of sound; got 0 m\/s/);
  });
});
