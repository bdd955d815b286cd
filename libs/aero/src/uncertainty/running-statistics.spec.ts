import { max, mean, min, sampleStandardDeviation, sampleVariance } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { AeroInputError } from '../errors/aero-input-error';
import { RunningStatistics } from './running-statistics';

/** Deterministic pseudo-random numbers in [0, 1) (mulberry32), so the test is repeatable. */
function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

describe('RunningStatistics', () => {
  it('matches simple-statistics on 10 000 random readings to 1e-12', () => {
    // simple-statistics (npm reference library): mean, sampleVariance, sampleStandardDeviation, min, max, ±1e-12 relative.
    // Readings near 500 N with ±5 N scatter, like a drag channel, where a one-pass Σx² formula would lose digits.
    const random = seededRandom(20260101);
    const values = Array.from({ length: 10_000 }, () => 500 + 10 * (random() - 0.5));
    const stats = new RunningStatistics();
    for (const value of values) stats.push(value);
    expect(stats.n).toBe(10_000);
    expect(Math.abs(stats.mean / mean(values) - 1)).toBeLessThan(1e-12);
    expect(Math.abs(stats.variance / sampleVariance(values) - 1)).toBeLessThan(1e-12);
    expect(Math.abs(stats.standardDeviation / sampleStandardDeviation(values) - 1)).toBeLessThan(1e-12);
    expect(Math.abs(stats.standardError / (sampleStandardDeviation(values) / 100) - 1)).toBeLessThan(1e-12);
    expect(stats.min).toBe(min(values));
    expect(stats.max).toBe(max(values));
  });

  it('gives mean 2 and variance 1 for 1, 2, 3', () => {
    // Definition: mean (1+2+3)/3 = 2; s² = (1 + 0 + 1)/2 = 1.
    const stats = new RunningStatistics();
    [1, 2, 3].forEach((x) => stats.push(x));
    expect(stats.mean).toBe(2);
    expect(stats.variance).toBe(1);
  });

  it('gives zero variance for repeated zeros', () => {
    const stats = new RunningStatistics();
    stats.push(0);
    stats.push(0);
    expect(stats.variance).toBe(0);
    expect(stats.mean).toBe(0);
  });

  it('says what is missing before enough readings', () => {
    const stats = new RunningStatistics();
    expect(() => stats.mean).toThrow(expect.objectContaining({ code: 'EMPTY_INPUT' }));
    stats.push(4);
    expect(stats.mean).toBe(4);
    expect(stats.min).toBe(4);
    expect(() => stats.variance).toThrow('`RunningStatistics.variance` requires at least 2 readings; got 1');
  });

  it('rejects NaN and infinity without changing the totals', () => {
    const stats = new RunningStatistics();
    stats.push(1);
    expect(() => stats.push(Number.NaN)).toThrow(/reading number 2; got NaN/);
    expect(() => stats.push(Number.NEGATIVE_INFINITY)).toThrow(AeroInputError);
    expect(stats.n).toBe(1);
    expect(stats.mean).toBe(1);
  });
});
