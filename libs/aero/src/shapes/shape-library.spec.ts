import { describe, expect, it } from 'vitest';
import { findShape } from './find-shape';
import { shapeArea } from './shape-area';
import { SHAPE_LIBRARY } from './shape-library';

const relative = (actual: number, expected: number): number => Math.abs(actual - expected) / Math.abs(expected);

describe('SHAPE_LIBRARY', () => {
  it('has unique ids and unique family/orientation pairs', () => {
    const ids = SHAPE_LIBRARY.map((entry) => entry.id);
    const pairs = SHAPE_LIBRARY.map((entry) => `${entry.family}/${entry.orientation}`);
    expect(new Set(ids).size).toBe(ids.length);
    expect(new Set(pairs).size).toBe(pairs.length);
  });

  it('cites a source for every entry and states each reference-area rule in words', () => {
    for (const entry of SHAPE_LIBRARY) {
      expect(entry.source.citation.length, entry.id).toBeGreaterThan(20);
      expect(entry.referenceArea.formula.length, entry.id).toBeGreaterThan(3);
      expect(entry.referenceArea.dimensions.length, entry.id).toBeGreaterThan(0);
    }
  });

  it('gives every 2-D and 3-D body a characteristic length it also asks a dimension for', () => {
    for (const entry of SHAPE_LIBRARY.filter((e) => e.kind !== 'object')) {
      expect(entry.characteristicLength, entry.id).not.toBeNull();
      expect(entry.referenceArea.dimensions, entry.id).toContain(entry.characteristicLength?.dimension);
    }
  });

  it('gives every whole object a typical frontal area', () => {
    for (const entry of SHAPE_LIBRARY.filter((e) => e.kind === 'object')) {
      expect(entry.typicalFrontalArea, entry.id).toBeGreaterThan(0);
    }
  });

  it('evaluates the sphere and the cross-flow cylinder from curves, not fixed numbers', () => {
    expect(findShape('sphere').dragCoefficient).toEqual({ curve: 'sphere' });
    expect(findShape('circular-cylinder-cross-flow').dragCoefficient).toEqual({ curve: 'cylinder' });
  });

  // Each expected value is read from the handbook the entry cites (see shape-sources.ts).
  it.each([
    ['square-section-flat-on', 2.2], // Munson et al., Fig. 9.19: square rod, R/D = 0, Re = 1e5
    ['half-tube-concave-to-flow', 2.3], // Munson et al., Fig. 9.19: semicircular shell, Re = 2e4
    ['half-tube-convex-to-flow', 1.1], // Munson et al., Fig. 9.19: semicircular shell, Re = 2e4
    ['flat-plate-2d-normal', 1.9], // Munson et al., Fig. 9.19: rectangle, depth/height < 0.1, Re = 1e5
    ['disk-normal', 1.1], // Munson et al., Fig. 9.20: thin disk, Re > 1e3
    ['cube-flat-on', 1.05], // Munson et al., Fig. 9.20: cube, Re > 1e4
    ['cube-edge-on', 0.8], // Munson et al., Fig. 9.20: cube edge-on, Re > 1e4
    ['hollow-hemisphere-concave-to-flow', 1.42], // Munson et al., Fig. 9.20: hollow hemisphere
    ['hollow-hemisphere-convex-to-flow', 0.38], // Munson et al., Fig. 9.20: hollow hemisphere
    ['solid-hemisphere-flat-to-flow', 1.17], // Munson et al., Fig. 9.20: solid hemisphere
    ['solid-hemisphere-convex-to-flow', 0.42], // Munson et al., Fig. 9.20: solid hemisphere
    ['streamlined-body', 0.04], // Munson et al., Fig. 9.20: streamlined body, Re > 1e5
    ['square-plate-normal', 1.17], // Matthews, Aeronautical Engineer's Data Book, Fig. 5.13(b): squared flat plate at 90°
    ['cone-60-apex-to-flow', 0.51], // Matthews, Aeronautical Engineer's Data Book, Fig. 5.13(b): cone α = 60°
    ['rider-upright', 1.1], // Wickert & Lewis, Table 6.4: bicycle and rider (upright)
    ['rider-racing', 0.88], // Munson et al., bicycle entries: racing
    ['rider-drafting', 0.5], // Munson et al., bicycle entries: drafting
    ['rider-streamlined', 0.12], // Munson et al., bicycle entries: streamlined
    ['person-standing', 1.2], // Wickert & Lewis, Table 6.4: person (standing)
  ])('%s has the tabulated C_D %f', (id, expected) => {
    const value = findShape(id).dragCoefficient;
    expect(typeof value).toBe('number');
    expect(relative(value as number, expected)).toBeLessThan(1e-12);
  });

  it.each([
    ['rider-upright', 0.53], // Wickert & Lewis, Table 6.4: 0.53 m²
    ['rider-racing', 0.3623], // Munson et al.: 3.9 ft² × 0.09290304 m²/ft² (NIST SP 811) = 0.3623 m²
    ['rider-drafting', 0.3623], // Munson et al.: 3.9 ft² = 0.3623 m²
    ['rider-streamlined', 0.4645], // Munson et al.: 5.0 ft² = 0.4645 m²
    ['person-standing', 0.62], // Wickert & Lewis, Table 6.4: 0.62 m²
  ])('%s carries the frontal area its source gives (%f m²) to two figures', (id, expected) => {
    expect(relative(findShape(id).typicalFrontalArea ?? Number.NaN, expected)).toBeLessThan(0.02);
  });

  it('states that a drafting rider has about 0.57 of the leading racing rider\'s C_D', () => {
    // Munson et al., bicycle entries: drafting 0.50 / racing 0.88 = 0.568
    const ratio = (findShape('rider-drafting').dragCoefficient as number) / (findShape('rider-racing').dragCoefficient as number);
    expect(relative(ratio, 0.5 / 0.88)).toBeLessThan(1e-12);
  });
});

describe('reference-area rules', () => {
  it('uses length × diameter for a cylinder in cross-flow, not the circle area', () => {
    const entry = findShape('circular-cylinder-cross-flow');
    const area = shapeArea(entry.referenceArea, { length: 2, diameter: 0.05 });
    expect(relative(area, 0.1)).toBeLessThan(1e-12); // definition: 2 m × 0.05 m
    expect(relative(area, (Math.PI * 0.05 ** 2) / 4)).toBeGreaterThan(1); // πd²/4 would be 0.00196 m²
  });

  it('uses π d² / 4 for a sphere', () => {
    const area = shapeArea(findShape('sphere').referenceArea, { diameter: 0.2 });
    expect(relative(area, 0.031415926535897934)).toBeLessThan(1e-12); // definition: π × 0.04 / 4
  });

  it('uses span × frontal height for every 2-D section', () => {
    for (const entry of SHAPE_LIBRARY.filter((e) => e.kind === '2-d')) {
      const area = shapeArea(entry.referenceArea, { length: 3, diameter: 0.1, side: 0.1, height: 0.1 });
      expect(relative(area, 0.3), entry.id).toBeLessThan(1e-12); // definition: 3 m × 0.1 m
    }
  });

  it('bases the edge-on cube on one face but reports the √2 larger silhouette for blockage', () => {
    const entry = findShape('cube', 'edge-on');
    expect(relative(shapeArea(entry.referenceArea, { side: 0.5 }), 0.25)).toBeLessThan(1e-12); // Munson Fig. 9.20: A = D²
    expect(entry.frontalArea).toBeDefined();
    if (entry.frontalArea) {
      expect(relative(shapeArea(entry.frontalArea, { side: 0.5 }), 0.25 * Math.SQRT2)).toBeLessThan(1e-12); // geometry
    }
  });

  it.each([Number.NaN, Number.POSITIVE_INFINITY, 0, -1])('rejects a diameter of %f', (diameter) => {
    expect(() => shapeArea(findShape('sphere').referenceArea, { diameter })).toThrow(/`shapeArea` requires/);
  });

  it('rejects a missing dimension by name', () => {
    expect(() => shapeArea(findShape('circular-cylinder-cross-flow').referenceArea, { diameter: 1 })).toThrow(/requires a finite length \(for length × diameter/);
  });
});

describe('findShape', () => {
  it('finds by family and orientation', () => {
    expect(findShape('half-tube', 'concave-to-flow').id).toBe('half-tube-concave-to-flow');
  });

  it('asks for an orientation when a family has several', () => {
    expect(() => findShape('cube')).toThrow(/`findShape` requires an orientation for 'cube' \(one of flat-on, edge-on\)/);
  });

  it('rejects an unknown id or orientation', () => {
    expect(() => findShape('teapot')).toThrow(/`findShape` requires a known shape id/);
    expect(() => findShape('cube', 'corner-on')).toThrow(/flat-on, edge-on/);
  });
});
