import { describe, expect, it } from 'vitest';
import { turbulenceFactor } from '../corrections/turbulence-factor';
import { AeroInputError } from '../errors/aero-input-error';
import { criticalReynoldsNumber, type DragPoint } from './critical-reynolds-number';
import { sampleReferenceCurve } from './sample-reference-curve';

// An invented sphere sweep in a slightly turbulent tunnel: the crisis arrives early, between Re 2e5 and 2.5e5.
const SWEEP: DragPoint[] = [
  { reynoldsNumber: 2.5e5, dragCoefficient: 0.2 },
  { reynoldsNumber: 1.0e5, dragCoefficient: 0.47 },
  { reynoldsNumber: 3.0e5, dragCoefficient: 0.12 },
  { reynoldsNumber: 1.5e5, dragCoefficient: 0.46 },
  { reynoldsNumber: 2.0e5, dragCoefficient: 0.42 },
];

describe('criticalReynoldsNumber', () => {
  it('interpolates in log Re between the bracketing points, whatever their order', () => {
    // Linear interpolation in ln Re (Barlow, Rae & Pope 1999, ch. 4 method — from memory): fraction
    // (0.42 − 0.3)/(0.42 − 0.2) = 6/11, Re = 2e5 · 1.25^(6/11) = 225 886.36 (hand arithmetic), ±1e-6 relative.
    const result = criticalReynoldsNumber(SWEEP);
    if (result.reynoldsNumber === null) throw new Error(result.reason);
    expect(Math.abs(result.reynoldsNumber / (2e5 * 1.25 ** (6 / 11)) - 1)).toBeLessThan(1e-12);
    expect(Math.abs(result.reynoldsNumber / 225886.36 - 1)).toBeLessThan(1e-6);
    expect(result.bracket.map((p) => p.reynoldsNumber)).toEqual([2e5, 2.5e5]);
    expect(result.crossingCount).toBe(1);
  });

  it('gives the tunnel turbulence factor TF = 385 000/Re_crit = 1.704397', () => {
    // Barlow, Rae & Pope 1999, ch. 4, after Dryden — from memory: TF = 385 000/225 886.36 = 1.704397.
    const result = criticalReynoldsNumber(SWEEP);
    if (result.reynoldsNumber === null) throw new Error(result.reason);
    expect(Math.abs(turbulenceFactor(result.reynoldsNumber) / 1.704397 - 1)).toBeLessThan(1e-6);
  });

  it('finds Morrison’s fit falling through 0.3 at Re 2.518e5', () => {
    // Morrison 2013 correlation: C_D = 0.3 at Re = 2.518e5, ±0.1 %. Sampled at 2001 log-spaced points, the
    // interpolation error is far below that band.
    const points = sampleReferenceCurve('sphere-morrison', { from: 1e5, to: 1e6, count: 2001 });
    const result = criticalReynoldsNumber(points);
    if (result.reynoldsNumber === null) throw new Error(result.reason);
    expect(Math.abs(result.reynoldsNumber / 2.518e5 - 1)).toBeLessThan(1e-3);
  });

  it('returns an exact hit on the threshold', () => {
    const result = criticalReynoldsNumber([
      { reynoldsNumber: 2e5, dragCoefficient: 0.3 },
      { reynoldsNumber: 3e5, dragCoefficient: 0.1 },
    ]);
    expect(result.reynoldsNumber).toBe(2e5);
  });

  it('takes another threshold', () => {
    // With threshold 0.46 the crossing lies between 1.5e5 (0.46) and 2e5, at its lower end exactly.
    expect(criticalReynoldsNumber(SWEEP, 0.46).reynoldsNumber).toBe(1.5e5);
  });

  it('returns null with a reason when there is no crossing', () => {
    const subcritical = criticalReynoldsNumber(SWEEP.filter((p) => p.dragCoefficient > 0.3));
    expect(subcritical).toEqual({ reynoldsNumber: null, reason: expect.stringMatching(/at or above 0.3.*higher Re/) });
    const supercritical = criticalReynoldsNumber(SWEEP.filter((p) => p.dragCoefficient < 0.3));
    expect(supercritical.reynoldsNumber).toBeNull();
    expect('reason' in supercritical && supercritical.reason).toMatch(/below 0.3.*lower Re/);
    const rising = criticalReynoldsNumber([
      { reynoldsNumber: 1e5, dragCoefficient: 0.1 },
      { reynoldsNumber: 2e5, dragCoefficient: 0.5 },
    ]);
    expect('reason' in rising && rising.reason).toMatch(/only rises/);
    expect(criticalReynoldsNumber([SWEEP[0]]).reynoldsNumber).toBeNull();
    expect(criticalReynoldsNumber([]).reynoldsNumber).toBeNull();
  });

  it('counts repeated crossings of a noisy sweep and keeps the first', () => {
    const noisy = [...SWEEP, { reynoldsNumber: 3.5e5, dragCoefficient: 0.31 }, { reynoldsNumber: 4e5, dragCoefficient: 0.1 }];
    const result = criticalReynoldsNumber(noisy);
    if (result.reynoldsNumber === null) throw new Error(result.reason);
    expect(result.crossingCount).toBe(2);
    expect(result.bracket[0].reynoldsNumber).toBe(2e5);
  });

  it('rejects NaN, infinity and zero Re, naming the point', () => {
    expect(() => criticalReynoldsNumber([...SWEEP, { reynoldsNumber: 1e5, dragCoefficient: Number.NaN }])).toThrow(/drag coefficient at point 5; got NaN/);
    expect(() => criticalReynoldsNumber([{ reynoldsNumber: Number.POSITIVE_INFINITY, dragCoefficient: 0.4 }])).toThrow(AeroInputError);
    expect(() => criticalReynoldsNumber([{ reynoldsNumber: 0, dragCoefficient: 0.4 }])).toThrow(/positive Reynolds number at point 0; got 0/);
  });
});
