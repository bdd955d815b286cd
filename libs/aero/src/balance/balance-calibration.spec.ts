import { describe, expect, it } from 'vitest';
import { BalanceCalibration } from './balance-calibration';
import { BalanceConvergenceError } from './balance-convergence-error';
import { interactionTerms } from './interaction-terms';
import { invertMatrix } from './invert-matrix';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

// An invented, diagonally dominant 6×6 primary-sensitivity matrix, mV/V per N (or N·m).
const C1 = [
  [2.0e-3, 2.0e-5, -1.5e-5, 0, 1.0e-5, 0],
  [1.0e-5, 2.0e-3, 0, 2.0e-5, 0, -1.0e-5],
  [-1.0e-5, 0, 5.0e-4, 0, 5.0e-6, 0],
  [0, 3.0e-5, 0, 3.0e-3, 0, 2.0e-5],
  [2.0e-5, 0, 1.0e-5, 0, 3.0e-3, 0],
  [0, -2.0e-5, 0, 1.5e-5, 0, 3.0e-3],
];
const F = [120, -35, 800, 12, -40, 6];
const times = (m: number[][], v: number[]) => m.map((row) => row.reduce((s, c, j) => s + c * v[j], 0));

describe('BalanceCalibration', () => {
  it('linear case: a diagonal C1 gives F_i = R_i / C1_ii (AIAA R-091-2003, linear case F = C1⁻¹R)', () => {
    const diag = [[2e-3, 0, 0, 0, 0, 0], [0, 4e-3, 0, 0, 0, 0], [0, 0, 5e-4, 0, 0, 0], [0, 0, 0, 3e-3, 0, 0], [0, 0, 0, 0, 2.5e-3, 0], [0, 0, 0, 0, 0, 1e-3]];
    const cal = new BalanceCalibration({ linear: diag, tolerance: 1e-12, maxIterations: 50 });
    const out = cal.loadsFromBridges([0.2, 0.4, 0.05, 0.03, -0.025, 0.001], new Float64Array(6));
    // Hand division: 0.2/2e-3 = 100, 0.4/4e-3 = 100, 0.05/5e-4 = 100, 0.03/3e-3 = 10, −0.025/2.5e-3 = −10, 0.001/1e-3 = 1.
    [100, 100, 100, 10, -10, 1].forEach((expected, i) => expect(rel(out[i], expected)).toBeLessThan(1e-12));
    expect(cal.lastIterations).toBe(0);
  });

  it('linear case with cross-talk: recovers F from R = C1·F formed in the test', () => {
    const cal = new BalanceCalibration({ linear: C1, tolerance: 1e-12, maxIterations: 50 });
    const out = cal.loadsFromBridges(times(C1, F), new Float64Array(6));
    F.forEach((f, i) => expect(rel(out[i], f)).toBeLessThan(1e-11));
  });

  it('with interactions and a zero C2 it equals the linear answer', () => {
    const zeroC2 = Array.from({ length: 6 }, () => new Array<number>(21).fill(0));
    const R = times(C1, F);
    const linear = new BalanceCalibration({ linear: C1, tolerance: 1e-12, maxIterations: 50 }).loadsFromBridges(R, new Float64Array(6));
    const iterative = new BalanceCalibration({ linear: C1, interaction: zeroC2, tolerance: 1e-12, maxIterations: 50 }).loadsFromBridges(R, new Float64Array(6));
    for (let i = 0; i < 6; i++) expect(iterative[i]).toBeCloseTo(linear[i], 12);
  });

  it('known interaction case: recovers F from R = C1·F + C2·H(F) (Ulbrich, NASA NTRS 20120006665, iterative method)', () => {
    const C2 = Array.from({ length: 6 }, (_, i) => Array.from({ length: 21 }, (_, j) => ((i + 2) * ((j % 4) - 1.5)) * 2e-10));
    // H(F) written out in the test: squares, then products i<j in row order.
    const H = F.map((f) => f * f);
    for (let i = 0; i < 6; i++) for (let j = i + 1; j < 6; j++) H.push(F[i] * F[j]);
    const R = times(C1, F).map((r, i) => r + C2[i].reduce((s, c, j) => s + c * H[j], 0));
    const cal = new BalanceCalibration({ linear: C1, interaction: C2, tolerance: 1e-13, maxIterations: 100 });
    const out = cal.loadsFromBridges(R, new Float64Array(6));
    F.forEach((f, i) => expect(rel(out[i], f)).toBeLessThan(1e-10));
    expect(cal.lastIterations).toBeGreaterThan(1);
    // The linear answer alone is measurably off, so the iteration did real work.
    const linear = new BalanceCalibration({ linear: C1, tolerance: 1e-12, maxIterations: 50 }).loadsFromBridges(R, new Float64Array(6));
    expect(rel(linear[0], F[0])).toBeGreaterThan(1e-4);
  });

  it('non-convergence is an error, never a silent answer', () => {
    const C2 = Array.from({ length: 6 }, () => new Array<number>(21).fill(1e-3));
    const cal = new BalanceCalibration({ linear: C1, interaction: C2, tolerance: 1e-12, maxIterations: 20 });
    expect(() => cal.loadsFromBridges(times(C1, F), new Float64Array(6))).toThrow(BalanceConvergenceError);
  });

  it('a singular C1 is refused', () => {
    const singular = C1.map((row) => [...row]);
    singular[5] = [...singular[4]];
    expect(() => new BalanceCalibration({ linear: singular, tolerance: 1e-12, maxIterations: 5 })).toThrow(/non-singular/);
  });
});

describe('invertMatrix', () => {
  it('inverts [[4,7],[2,6]] to [[0.6,−0.7],[−0.2,0.4]] (hand calculation: det 10)', () => {
    const inv = invertMatrix([[4, 7], [2, 6]]);
    [0.6, -0.7, -0.2, 0.4].forEach((v, i) => expect(inv[i]).toBeCloseTo(v, 14));
  });
  it('refuses NaN entries and non-square input', () => {
    expect(() => invertMatrix([[1, NaN], [0, 1]])).toThrow(/finite/);
    expect(() => invertMatrix([[1, 2]])).toThrow(/square/);
  });
});

describe('interactionTerms', () => {
  it('orders squares then products i<j (F1F2 at 6, F5F6 at 20)', () => {
    const h = interactionTerms([1, 2, 3, 4, 5, 6], new Float64Array(21));
    expect(Array.from(h.subarray(0, 6))).toEqual([1, 4, 9, 16, 25, 36]);
    expect(h[6]).toBe(2);
    expect(h[20]).toBe(30);
  });
});
