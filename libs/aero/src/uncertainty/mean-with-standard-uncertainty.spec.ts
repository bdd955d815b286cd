import { mean, sampleStandardDeviation } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { AeroInputError } from '../errors/aero-input-error';
import { meanWithStandardUncertainty } from './mean-with-standard-uncertainty';

const READINGS = [50.12, 49.87, 50.05, 49.95, 50.2, 49.8, 50.1, 49.92, 50.03, 49.96];

describe('meanWithStandardUncertainty', () => {
  it('gives mean 50.0000, s 0.12257, s/√n 0.03876 for the ten readings', () => {
    // GUM, JCGM 100:2008, 4.2.3 (eq. 5 — from memory): x̄ = 50.0000, s = 0.12257, u = s/√10 = 0.03876. The printed
    // figures are rounded to 1e-5, so they are met to ±1e-5 absolute (s is 0.1225652, 4e-5 relative from 0.12257).
    const result = meanWithStandardUncertainty(READINGS);
    expect(result.n).toBe(10);
    expect(Math.abs(result.mean - 50)).toBeLessThan(1e-5);
    expect(Math.abs(result.standardDeviation - 0.12257)).toBeLessThan(1e-5);
    expect(Math.abs(result.standardUncertainty - 0.03876)).toBeLessThan(1e-5);
    // Recomputed by hand to seven digits: s = 0.1225652, s/√10 = 0.03875851, ±1e-6 relative.
    expect(Math.abs(result.standardDeviation / 0.1225652 - 1)).toBeLessThan(1e-6);
    expect(Math.abs(result.standardUncertainty / 0.03875851 - 1)).toBeLessThan(1e-6);
  });

  it('agrees with simple-statistics mean and sampleStandardDeviation', () => {
    // simple-statistics (npm reference library): mean and sampleStandardDeviation (n − 1), ±1e-14 relative.
    const result = meanWithStandardUncertainty(READINGS);
    expect(Math.abs(result.mean / mean(READINGS) - 1)).toBeLessThan(1e-14);
    expect(Math.abs(result.standardDeviation / sampleStandardDeviation(READINGS) - 1)).toBeLessThan(1e-12);
  });

  it('gives zero spread for identical readings', () => {
    expect(meanWithStandardUncertainty([7, 7, 7])).toEqual({ n: 3, mean: 7, standardDeviation: 0, standardUncertainty: 0 });
  });

  it('rejects fewer than two readings', () => {
    expect(() => meanWithStandardUncertainty([])).toThrow(expect.objectContaining({ code: 'EMPTY_INPUT' }));
    expect(() => meanWithStandardUncertainty([1])).toThrow(/at least two readings.*got 1/);
  });

  it('rejects NaN and infinity, naming the index', () => {
    expect(() => meanWithStandardUncertainty([1, Number.NaN])).toThrow(/reading at index 1; got NaN/);
    expect(() => meanWithStandardUncertainty([Number.POSITIVE_INFINITY, 1])).toThrow(AeroInputError);
  });
});
