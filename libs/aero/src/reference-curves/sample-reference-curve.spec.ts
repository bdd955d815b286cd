import { describe, expect, it } from 'vitest';
import { AeroInputError } from '../errors/aero-input-error';
import { referenceCurves, type ReferenceCurveId } from './reference-curves';
import { sampleReferenceCurve } from './sample-reference-curve';
import { sphereDragWhite } from './sphere-drag-white';

describe('referenceCurves', () => {
  it('lists five curves with unique ids, a source and a range', () => {
    const ids = referenceCurves.map((c) => c.id);
    expect(new Set(ids).size).toBe(5);
    for (const curve of referenceCurves) {
      expect(curve.source.length).toBeGreaterThan(10);
      expect(curve.validRange.max).toBeGreaterThan(curve.validRange.min);
    }
  });

  it('wires each id to its function', () => {
    // White, Viscous Fluid Flow — from memory: cylinder 1 + 10·Re^(−2/3) = 1.1 at Re 1000.
    const cylinder = referenceCurves.find((c) => c.id === 'cylinder-white');
    expect(cylinder?.fn(1000)).toBeCloseTo(1.1, 12);
  });
});

describe('sampleReferenceCurve', () => {
  it('spaces points evenly in log Re, ends exact', () => {
    const points = sampleReferenceCurve('sphere-white', { from: 1, to: 1e5, count: 6 });
    expect(points.map((p) => p.reynoldsNumber)).toEqual([1, expect.closeTo(10, 10), expect.closeTo(100, 9), expect.closeTo(1000, 8), expect.closeTo(1e4, 7), 1e5]);
    for (const point of points) expect(point.dragCoefficient).toBe(sphereDragWhite(point.reynoldsNumber));
  });

  it('rejects an unknown id, a bad range and one outside validity', () => {
    expect(() => sampleReferenceCurve('ellipsoid' as ReferenceCurveId, { from: 1, to: 10, count: 2 })).toThrow(expect.objectContaining({ code: 'UNKNOWN_ID' }));
    expect(() => sampleReferenceCurve('sphere-white', { from: Number.NaN, to: 10, count: 2 })).toThrow(AeroInputError);
    expect(() => sampleReferenceCurve('sphere-white', { from: 1, to: Number.POSITIVE_INFINITY, count: 2 })).toThrow(/finite "to"/);
    expect(() => sampleReferenceCurve('sphere-white', { from: 0, to: 10, count: 2 })).toThrow(/positive "from"/);
    expect(() => sampleReferenceCurve('sphere-white', { from: 10, to: 10, count: 2 })).toThrow(/"to" above "from"/);
    expect(() => sampleReferenceCurve('sphere-white', { from: 1, to: 10, count: 1.5 })).toThrow(/whole point count/);
    expect(() => sampleReferenceCurve('cylinder-white', { from: 0.1, to: 10, count: 3 })).toThrow(/inside the validity of cylinder-white \(Re 1 to 200000\)/);
  });
});
