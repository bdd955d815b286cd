import { describe, expect, it } from 'vitest';
import { RunningStatistics } from '../uncertainty';
import { ChannelStatistics } from './channel-statistics';
import { coefficientUncertainty } from './coefficient-uncertainty';

const READINGS = [50.12, 49.87, 50.05, 49.95, 50.2, 49.8, 50.1, 49.92, 50.03, 49.96];

describe('ChannelStatistics', () => {
  it('mean 50.0000, s 0.12257, s/√n 0.03876 for the ten readings (GUM 4.2.3 worked values) ±1e-5', () => {
    const stats = new ChannelStatistics(2);
    for (const x of READINGS) stats.push([x, 2 * x]);
    expect(Math.abs(stats.mean(0) - 50)).toBeLessThan(1e-5);
    expect(Math.abs(stats.standardDeviation(0) - 0.12257)).toBeLessThan(1e-5);
    expect(Math.abs(stats.standardError(0) - 0.03876)).toBeLessThan(1e-5);
    expect(Math.abs(stats.standardDeviation(1) - 2 * 0.12257)).toBeLessThan(2e-5);
  });
  it('agrees with RunningStatistics channel by channel', () => {
    const stats = new ChannelStatistics(1);
    const reference = new RunningStatistics();
    for (const x of READINGS) {
      stats.push([x]);
      reference.push(x);
    }
    expect(stats.mean(0)).toBeCloseTo(reference.mean, 12);
    expect(stats.standardDeviation(0)).toBeCloseTo(reference.standardDeviation, 12);
  });
  it('refuses NaN and leaves the count unchanged; gives 0 spread for a single sample', () => {
    const stats = new ChannelStatistics(1);
    stats.push([1]);
    expect(() => stats.push([NaN])).toThrow(/finite/);
    expect(stats.n).toBe(1);
    expect(stats.standardDeviation(0)).toBe(0);
    expect(Number.isNaN(new ChannelStatistics(1).mean(0))).toBe(true);
  });
});

describe('coefficientUncertainty', () => {
  it('B 0.004, S 0.006, N 5 gives P 0.005367 and U95 0.006693 ±1e-6 (AIAA S-071A, from memory)', () => {
    // u_B = u_F/(q_c·S) = 2/(1000·1) = 0.002, so B = 0.004.
    const u = coefficientUncertainty({
      coefficient: 0.3, correctedDynamicPressure: 1000, dynamicPressure: 1000, dynamicPressureUncertainty: 0,
      loadUncertainty: 2, referenceArea: 1, referenceAreaUncertainty: 0, sampleStandardDeviation: 0.006, sampleCount: 5,
    });
    expect(Math.abs(u.biasLimit - 0.004)).toBeLessThan(1e-12);
    expect(Math.abs(u.precisionLimit - 0.005367)).toBeLessThan(1e-6);
    expect(Math.abs(u.u95 - 0.006693)).toBeLessThan(1e-6);
    expect(u.expandedUncertainty).toBeCloseTo(u.u95, 12);
  });
  it('C_D = D/(qS): u_r² = u_r(D)² + u_r(q)² + u_r(S)² (GUM 5.1.6): 1 %, 0.5 %, 1 % → 1.5 %', () => {
    const u = coefficientUncertainty({
      coefficient: 0.3, correctedDynamicPressure: 600, dynamicPressure: 600, dynamicPressureUncertainty: 3,
      loadUncertainty: 1.8, referenceArea: 1, referenceAreaUncertainty: 0.01, sampleStandardDeviation: 0, sampleCount: 100,
    });
    expect(u.combinedStandardUncertainty / 0.3).toBeCloseTo(0.015, 12);
    expect(u.randomStandardUncertainty).toBe(0);
    expect(u.sensitivities.dynamicPressure).toBeCloseTo(-0.3 / 600, 15);
  });
  it('refuses zero dynamic pressure', () => {
    expect(() => coefficientUncertainty({
      coefficient: 0.3, correctedDynamicPressure: 0, dynamicPressure: 0, dynamicPressureUncertainty: 0,
      loadUncertainty: 0, referenceArea: 1, referenceAreaUncertainty: 0, sampleStandardDeviation: 0, sampleCount: 1,
    })).toThrow(/coefficientUncertainty/);
  });
});
