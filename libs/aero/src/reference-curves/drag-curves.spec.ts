import { describe, expect, it } from 'vitest';
import { AeroInputError } from '../errors/aero-input-error';
import { CYLINDER_DRAG_WHITE_RANGE, cylinderDragWhite } from './cylinder-drag-white';
import { SPHERE_DRAG_CLIFT_GAUVIN_RANGE, sphereDragCliftGauvin } from './sphere-drag-clift-gauvin';
import { SPHERE_DRAG_MORRISON_RANGE, sphereDragMorrison } from './sphere-drag-morrison';
import { sphereDragMorrisonBook } from './sphere-drag-morrison-book';
import { SPHERE_DRAG_WHITE_RANGE, sphereDragWhite } from './sphere-drag-white';

const ALL = [sphereDragMorrison, sphereDragMorrisonBook, sphereDragCliftGauvin, sphereDragWhite, cylinderDragWhite];

describe('sphereDragMorrisonBook', () => {
  it('gives 0.767731559965325 at Re 200 and 12000.134917101897 at Re 0.002', () => {
    // Morrison 2013, An Introduction to Fluid Mechanics (book form, last term Re^0.8/461000), as implemented by the
    // reference library fluids (C. Bell), fluids.drag.Morrison doctest and test_drag values, ±1e-12 relative.
    expect(Math.abs(sphereDragMorrisonBook(200) / 0.767731559965325 - 1)).toBeLessThan(1e-12);
    expect(Math.abs(sphereDragMorrisonBook(0.002) / 12000.134917101897 - 1)).toBeLessThan(1e-12);
  });
});

describe('sphereDragMorrison', () => {
  it('differs from the book form only in the last term', () => {
    // Morrison 2013: last terms 0.25(Re/1e6)/(1 + Re/1e6) vs Re^0.8/461000; at Re 200 they are 4.99990e-5 and 1.50357e-4.
    const difference = sphereDragMorrisonBook(200) - sphereDragMorrison(200);
    expect(Math.abs(difference / (200 ** 0.8 / 461000 - (0.25 * 2e-4) / (1 + 2e-4)) - 1)).toBeLessThan(1e-9);
  });

  it('approaches Stokes drag 24/Re at low Re', () => {
    // Stokes 1851 (Camb. Phil. Trans. 9:8 — from memory): C_D = 24/Re for creeping flow; the fit's other terms add ~2.6 % at Re 0.01.
    expect(Math.abs(sphereDragMorrison(0.01) / 2400 - 1)).toBeLessThan(0.001);
  });

  it('bottoms out near C_D 0.090 at Re ≈ 4.4e5', () => {
    // Morrison 2013: the fit's drag-crisis minimum is about 0.090 near Re 4.4e5 (recomputed 0.09020 at 4.436e5).
    expect(Math.abs(sphereDragMorrison(4.436e5) / 0.0902 - 1)).toBeLessThan(1e-3);
    expect(sphereDragMorrison(4.0e5)).toBeGreaterThan(sphereDragMorrison(4.436e5));
    expect(sphereDragMorrison(4.9e5)).toBeGreaterThan(sphereDragMorrison(4.436e5));
  });

  it('states validity to Re 1e6', () => {
    // Morrison 2013: valid up to Re = 1e6.
    expect(SPHERE_DRAG_MORRISON_RANGE.max).toBe(1e6);
  });
});

describe('sphereDragCliftGauvin', () => {
  it.each([
    // Clift & Gauvin 1970 (coefficient set 0.15, 0.687, 0.42, 4.25e4, −1.16), ±1e-5 relative.
    [1e2, 1.09379],
    [1e3, 0.46615],
    [1e4, 0.41672],
    [1e5, 0.49175],
  ])('Re %d → %d', (re, expected) => {
    expect(Math.abs(sphereDragCliftGauvin(re) / expected - 1)).toBeLessThan(1e-5);
  });

  it('states validity below Re 3e5', () => {
    // Clift & Gauvin 1970: Re < 3e5.
    expect(SPHERE_DRAG_CLIFT_GAUVIN_RANGE.max).toBe(3e5);
  });
});

describe('sphereDragWhite', () => {
  it('gives 27.4 at Re 1 and 1.18545 at Re 100', () => {
    // White, Viscous Fluid Flow — from memory: 24/Re + 6/(1 + √Re) + 0.4 → 24 + 3 + 0.4 = 27.4 at Re 1 and
    // 0.24 + 6/11 + 0.4 = 1.185455 at Re 100 (hand arithmetic), ±1e-12 relative.
    expect(Math.abs(sphereDragWhite(1) / 27.4 - 1)).toBeLessThan(1e-12);
    expect(Math.abs(sphereDragWhite(100) / (0.64 + 6 / 11) - 1)).toBeLessThan(1e-12);
    expect(SPHERE_DRAG_WHITE_RANGE.max).toBe(2e5);
  });
});

describe('cylinderDragWhite', () => {
  it.each([
    // White, Viscous Fluid Flow — from memory: 1 + 10·Re^(−2/3), ±1e-5 relative.
    [1e2, 1.46416],
    [1e3, 1.1],
    [1e4, 1.02154],
    [1e5, 1.00464],
  ])('Re %d → %d', (re, expected) => {
    expect(Math.abs(cylinderDragWhite(re) / expected - 1)).toBeLessThan(1e-5);
  });

  it('states validity 1 < Re < 2e5', () => {
    // White, Viscous Fluid Flow — from memory.
    expect(CYLINDER_DRAG_WHITE_RANGE).toEqual({ min: 1, max: 2e5 });
  });
});

describe('bad Reynolds numbers', () => {
  it.each(ALL.map((f) => [f.name, f] as const))('%s rejects NaN, infinity, zero and negatives', (name, curve) => {
    expect(() => curve(Number.NaN)).toThrow(AeroInputError);
    expect(() => curve(Number.POSITIVE_INFINITY)).toThrow(`\`${name}\` requires a finite Reynolds number; got Infinity`);
    expect(() => curve(0)).toThrow(`\`${name}\` requires a positive Reynolds number; got 0`);
    expect(() => curve(-5)).toThrow(expect.objectContaining({ code: 'OUT_OF_RANGE' }));
  });
});
