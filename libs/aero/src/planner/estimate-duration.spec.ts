import { describe, expect, it } from 'vitest';
import { compareWithMeasured } from './compare-with-measured';
import { estimateDuration } from './estimate-duration';
import { PLANNER_CAUTION } from './planner-caution';

const relative = (actual: number, expected: number): number => Math.abs(actual - expected) / Math.abs(expected);

describe('estimateDuration', () => {
  it('adds points × dwell, changes × change time and setup', () => {
    const estimate = estimateDuration({ points: 120, dwellSeconds: 30, configurationChanges: 4, changeMinutes: 15, setupMinutes: 90 });
    expect(relative(estimate.pointHours, 1)).toBeLessThan(1e-12); // definition: 120 × 30 s = 3600 s
    expect(relative(estimate.changeHours, 1)).toBeLessThan(1e-12); // definition: 4 × 15 min = 60 min
    expect(relative(estimate.setupHours, 1.5)).toBeLessThan(1e-12); // definition: 90 min
    expect(relative(estimate.hours, 3.5)).toBeLessThan(1e-12); // definition: sum
    expect(estimate.caution).toBe(PLANNER_CAUTION);
  });

  it('is zero for an empty plan', () => {
    expect(estimateDuration({ points: 0, dwellSeconds: 0, configurationChanges: 0, changeMinutes: 0, setupMinutes: 0 }).hours).toBe(0);
  });

  it.each([
    ['points', { points: 1.5 }],
    ['configurationChanges', { configurationChanges: -1 }],
    ['dwellSeconds', { dwellSeconds: Number.NaN }],
    ['setupMinutes', { setupMinutes: Number.POSITIVE_INFINITY }],
  ])('rejects a bad %s', (name, override) => {
    const input = { points: 1, dwellSeconds: 1, configurationChanges: 1, changeMinutes: 1, setupMinutes: 1, ...override };
    expect(() => estimateDuration(input)).toThrow(new RegExp(`^.estimateDuration. requires .*${name}`));
  });
});

describe('compareWithMeasured', () => {
  it('is the difference in percent of the measured value', () => {
    expect(relative(compareWithMeasured(0.33, 0.3).differencePercent, 10)).toBeLessThan(1e-12); // definition: 0.03 / 0.3
    expect(relative(compareWithMeasured(0.27, 0.3).differencePercent, -10)).toBeLessThan(1e-12); // definition: −0.03 / 0.3
    expect(compareWithMeasured(0.3, 0.3).differencePercent).toBe(0);
    expect(compareWithMeasured(0.3, 0.3).caution).toBe(PLANNER_CAUTION);
  });

  it.each([
    [0.3, 0],
    [0.3, -1],
    [Number.NaN, 0.3],
    [0.3, Number.POSITIVE_INFINITY],
  ])('rejects %f against %f', (estimated, measured) => {
    expect(() => compareWithMeasured(estimated, measured)).toThrow(/`compareWithMeasured` requires/);
  });
});

describe('PLANNER_CAUTION', () => {
  it('says design loads are for a licensed engineer under the local code', () => {
    expect(PLANNER_CAUTION).toMatch(/not a design value/);
    expect(PLANNER_CAUTION).toMatch(/licensed engineer/);
    expect(PLANNER_CAUTION).toMatch(/local code/);
  });
});
