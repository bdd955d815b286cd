import { describe, expect, it } from 'vitest';
import { interpolateTare } from './bilinear-tare';
import { transferMoments } from './transfer-moments';

describe('transferMoments', () => {
  it('adds r × F: r = (1, 2, 3) m, F = (4, 5, 6) N gives r × F = (−3, 6, −3) N·m (hand cross product)', () => {
    const loads = Float64Array.of(4, 5, 6, 10, 20, 30);
    transferMoments(loads, [1, 2, 3]);
    expect(Array.from(loads)).toEqual([4, 5, 6, 7, 26, 27]);
  });
  it('a zero offset leaves the moments unchanged', () => {
    const loads = Float64Array.of(1, 2, 3, 4, 5, 6);
    expect(Array.from(transferMoments(loads, [0, 0, 0]))).toEqual([1, 2, 3, 4, 5, 6]);
  });
});

describe('interpolateTare', () => {
  const table = { yaw: [0, 1], pitch: [0, 2], loads: [[[0, 0, 0, 0, 0, 0], [2, 0, 0, 0, 0, 0]], [[4, 0, 0, 0, 0, 0], [10, 0, 0, 0, 0, 0]]] };
  it('is bilinear: centre of the cell is the mean of the four corners (Press et al. 2007 §3.6)', () => {
    expect(interpolateTare(table, 0.5, 1, new Float64Array(6))[0]).toBeCloseTo(4, 14);
  });
  it('returns the corner values at the breakpoints', () => {
    expect(interpolateTare(table, 1, 2, new Float64Array(6))[0]).toBe(10);
    expect(interpolateTare(table, 0, 0, new Float64Array(6))[0]).toBe(0);
  });
  it('refuses an attitude outside the table instead of extrapolating', () => {
    expect(() => interpolateTare(table, 1.5, 0, new Float64Array(6))).toThrow(/inside the tare table/);
  });
});
