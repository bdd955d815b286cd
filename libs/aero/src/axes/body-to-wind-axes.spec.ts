import { describe, expect, it } from 'vitest';
import { bodyToWindAxes } from './body-to-wind-axes';
import { sideslipFromYaw } from './sideslip-from-yaw';

/** Seeded generator (mulberry32) so the random angles are the same on every run. */
function uniform(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = Math.imul(a ^ (a >>> 15), a | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

describe('bodyToWindAxes', () => {
  it('keeps |F| for random forces and angles: a rotation is orthogonal (Etkin 1972, from memory)', () => {
    const next = uniform(7);
    const out = new Float64Array(3);
    for (let k = 0; k < 1000; k++) {
      const [a, n, y] = [next() * 200 - 100, next() * 200 - 100, next() * 200 - 100];
      const alpha = (next() - 0.5) * Math.PI;
      const beta = (next() - 0.5) * 2 * Math.PI;
      bodyToWindAxes(a, n, y, alpha, beta, out);
      expect(Math.hypot(out[0], out[1], out[2]) / Math.hypot(a, n, y)).toBeCloseTo(1, 12);
    }
  });
  it('at α = β = 0 drag is the axial force, lift the normal force, side force unchanged', () => {
    expect(Array.from(bodyToWindAxes(10, 3, -2, 0, 0, new Float64Array(3)))).toEqual([10, 3, -2]);
  });
  it('at α = 90° the normal force is all drag and the axial force is negative lift (definition)', () => {
    const out = bodyToWindAxes(5, 7, 0, Math.PI / 2, 0, new Float64Array(3));
    expect(out[0]).toBeCloseTo(7, 12);
    expect(out[1]).toBeCloseTo(-5, 12);
  });
  it('β = −ψ: yawing the nose to starboard by 10° makes a body-axis side force add to the drag', () => {
    const out = bodyToWindAxes(0, 0, 1, 0, sideslipFromYaw(10 * (Math.PI / 180)), new Float64Array(3));
    // D = −Y·sinβ = sin 10° = 0.17364817766693033 (hand value).
    expect(out[0]).toBeCloseTo(0.17364817766693033, 14);
  });
  it('NaN in gives NaN out', () => {
    expect(Number.isNaN(bodyToWindAxes(NaN, 0, 0, 0, 0, new Float64Array(3))[0])).toBe(true);
  });
});
