import { describe, expect, it } from 'vitest';
import { AeroInputError } from '../errors/aero-input-error';
import { combinedStandardUncertainty } from './combined-standard-uncertainty';
import { dynamicPressureRelativeUncertainty } from './dynamic-pressure-relative-uncertainty';
import { COVERAGE_FACTOR_95, expandedUncertainty } from './expanded-uncertainty';
import { forceCoefficientRelativeUncertainty } from './force-coefficient-relative-uncertainty';
import { precisionLimit } from './precision-limit';
import { u95 } from './u95';

describe('combinedStandardUncertainty', () => {
  it('adds c_i·u_i in quadrature', () => {
    // GUM, JCGM 100:2008, 5.1.2 eq. 10 (from memory): √((1·3)² + (2·2)²) = 5, exact.
    expect(combinedStandardUncertainty([{ sensitivity: 1, standardUncertainty: 3 }, { sensitivity: -2, standardUncertainty: 2 }])).toBe(5);
  });

  it('does not overflow for huge terms', () => {
    expect(combinedStandardUncertainty([{ sensitivity: 1e200, standardUncertainty: 3e100 }, { sensitivity: 4e200, standardUncertainty: 1e100 }])).toBeCloseTo(5e300, -290);
  });

  it('gives zero for zero uncertainties', () => {
    expect(combinedStandardUncertainty([{ sensitivity: 3, standardUncertainty: 0 }])).toBe(0);
  });

  it('rejects no terms, NaN, infinity and negative u', () => {
    expect(() => combinedStandardUncertainty([])).toThrow(expect.objectContaining({ code: 'EMPTY_INPUT' }));
    expect(() => combinedStandardUncertainty([{ sensitivity: Number.NaN, standardUncertainty: 1 }])).toThrow(/sensitivity of term 0/);
    expect(() => combinedStandardUncertainty([{ sensitivity: 1, standardUncertainty: Number.POSITIVE_INFINITY }])).toThrow(AeroInputError);
    expect(() => combinedStandardUncertainty([{ sensitivity: 1, standardUncertainty: 1 }, { sensitivity: 1, standardUncertainty: -1 }])).toThrow(/non-negative standard uncertainty of term 1/);
  });
});

describe('expandedUncertainty', () => {
  it('multiplies by k = 2 by default', () => {
    // GUM, JCGM 100:2008, 6.2.1 and 6.3.3 (from memory): U = k·u_c, k = 2 for about 95 %.
    expect(COVERAGE_FACTOR_95).toBe(2);
    expect(expandedUncertainty(0.03876)).toBe(0.07752);
    expect(expandedUncertainty(0.01, 3)).toBeCloseTo(0.03, 15);
    expect(expandedUncertainty(0)).toBe(0);
  });

  it('rejects NaN, infinity, negative u and zero k', () => {
    expect(() => expandedUncertainty(Number.NaN)).toThrow(AeroInputError);
    expect(() => expandedUncertainty(Number.POSITIVE_INFINITY)).toThrow(/finite combined standard uncertainty/);
    expect(() => expandedUncertainty(-0.1)).toThrow(/non-negative/);
    expect(() => expandedUncertainty(0.1, 0)).toThrow(/positive coverage factor; got 0/);
  });
});

describe('forceCoefficientRelativeUncertainty', () => {
  const INPUT = {
    force: { value: 20, standardUncertainty: 0.06 },
    dynamicPressure: { value: 500, standardUncertainty: 2 },
    referenceArea: { value: 0.1, standardUncertainty: 0.0001 },
  };

  it('adds the relative uncertainties of F, q and S in quadrature', () => {
    // GUM, JCGM 100:2008, 5.1.6 (from memory): u_r² = 0.003² + 0.004² + 0.001² → u_r = √26e-6 = 0.0050990, ±1e-12.
    expect(Math.abs(forceCoefficientRelativeUncertainty(INPUT) / Math.sqrt(26e-6) - 1)).toBeLessThan(1e-12);
  });

  it('uses |F| for a negative force (e.g. downforce)', () => {
    const negative = { ...INPUT, force: { value: -20, standardUncertainty: 0.06 } };
    expect(forceCoefficientRelativeUncertainty(negative)).toBe(forceCoefficientRelativeUncertainty(INPUT));
  });

  it('says the wind is off for zero q and refuses a zero force', () => {
    expect(() => forceCoefficientRelativeUncertainty({ ...INPUT, dynamicPressure: { value: 0, standardUncertainty: 1 } })).toThrow(expect.objectContaining({ code: 'ZERO_WIND' }));
    expect(() => forceCoefficientRelativeUncertainty({ ...INPUT, force: { value: 0, standardUncertainty: 0.06 } })).toThrow(/non-zero force/);
    expect(() => forceCoefficientRelativeUncertainty({ ...INPUT, referenceArea: { value: 0, standardUncertainty: 0 } })).toThrow(/positive reference area/);
  });

  it('rejects NaN and infinity', () => {
    expect(() => forceCoefficientRelativeUncertainty({ ...INPUT, force: { value: Number.NaN, standardUncertainty: 0.06 } })).toThrow(/finite force/);
    expect(() => forceCoefficientRelativeUncertainty({ ...INPUT, dynamicPressure: { value: 500, standardUncertainty: Number.POSITIVE_INFINITY } })).toThrow(AeroInputError);
  });
});

describe('dynamicPressureRelativeUncertainty', () => {
  it('counts the speed twice: u_r(q)² = u_r(ρ)² + 4u_r(V)²', () => {
    // GUM, JCGM 100:2008, 5.1.6 (from memory): u_r(ρ) 0.003, u_r(V) 0.002 → √(9e-6 + 16e-6) = 0.005, ±1e-12.
    const result = dynamicPressureRelativeUncertainty({ density: { value: 1.2, standardUncertainty: 0.0036 }, speed: { value: 30, standardUncertainty: 0.06 } });
    expect(Math.abs(result / 0.005 - 1)).toBeLessThan(1e-12);
  });

  it('says the wind is off for zero speed', () => {
    expect(() => dynamicPressureRelativeUncertainty({ density: { value: 1.2, standardUncertainty: 0 }, speed: { value: 0, standardUncertainty: 0.1 } })).toThrow(
      '`dynamicPressureRelativeUncertainty` requires a positive speed; got 0 m/s (is the wind on?)',
    );
  });

  it('rejects NaN, infinity and zero density', () => {
    expect(() => dynamicPressureRelativeUncertainty({ density: { value: Number.NaN, standardUncertainty: 0 }, speed: { value: 30, standardUncertainty: 0.1 } })).toThrow(AeroInputError);
    expect(() => dynamicPressureRelativeUncertainty({ density: { value: 1.2, standardUncertainty: 0 }, speed: { value: Number.POSITIVE_INFINITY, standardUncertainty: 0.1 } })).toThrow(/finite speed/);
    expect(() => dynamicPressureRelativeUncertainty({ density: { value: 0, standardUncertainty: 0 }, speed: { value: 30, standardUncertainty: 0.1 } })).toThrow(/positive density/);
  });
});

describe('precisionLimit and u95', () => {
  it('gives P 0.005367 and U95 0.006693 for B 0.004, S 0.006, N 5', () => {
    // AIAA S-071A-1999 — from memory: P = 2S/√N = 0.005367, U95 = √(B² + P²) = 0.006693, ±1e-6 absolute
    // (the printed figures have four significant digits; 1e-6 relative would exceed them).
    const p = precisionLimit(0.006, 5);
    expect(Math.abs(p - 0.005367)).toBeLessThan(1e-6);
    expect(Math.abs(u95(0.004, p) - 0.006693)).toBeLessThan(1e-6);
  });

  it('gives B alone with no scatter and zero for a perfect measurement', () => {
    expect(u95(0.004, precisionLimit(0, 5))).toBe(0.004);
    expect(u95(0, 0)).toBe(0);
  });

  it('rejects NaN, infinity, negative limits and bad N', () => {
    expect(() => precisionLimit(Number.NaN, 5)).toThrow(AeroInputError);
    expect(() => precisionLimit(0.006, Number.POSITIVE_INFINITY)).toThrow(/whole number of readings/);
    expect(() => precisionLimit(0.006, 0)).toThrow(/at least 1; got 0/);
    expect(() => u95(-0.004, 0.005)).toThrow(/non-negative bias limit/);
    expect(() => u95(0.004, Number.NaN)).toThrow(/finite precision limit/);
  });
});
