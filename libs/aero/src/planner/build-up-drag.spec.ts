import { describe, expect, it } from 'vitest';
import { buildUpDrag } from './build-up-drag';
import { PLANNER_CAUTION } from './planner-caution';

const relative = (actual: number, expected: number): number => Math.abs(actual - expected) / Math.abs(expected);

// ISA sea level, ISO 2533:1975: ρ = 1.225 kg/m³; μ = 1.7894e-5 Pa·s (from memory).
const AIR = { density: 1.225, viscosity: 1.7894e-5 };

// White's cylinder curve fit, written out here independently of reference-curves: C_D = 1 + 10·Re^(−2/3).
const whiteCylinder = (re: number): number => 1 + 10 * re ** (-2 / 3);

describe('buildUpDrag', () => {
  it('adds a mast of three cylinders as Σ C_D·L·d, each C_D at its own Reynolds number', () => {
    const speed = 10;
    const sections = [
      { length: 2, diameter: 0.1 },
      { length: 1.5, diameter: 0.06 },
      { length: 1, diameter: 0.03 },
    ];
    const result = buildUpDrag(
      sections.map((dimensions) => ({ shapeId: 'circular-cylinder-cross-flow', dimensions, count: 1 })),
      { speed, ...AIR },
    );
    // Hand calculation: Re = ρVd/μ, C_D from White's fit, A = L·d, D = ½ρV² Σ C_D·L·d.
    const handDragArea = sections.reduce((sum, { length, diameter }) => {
      const re = (AIR.density * speed * diameter) / AIR.viscosity;
      return sum + whiteCylinder(re) * length * diameter;
    }, 0);
    const handDrag = 0.5 * AIR.density * speed * speed * handDragArea;
    expect(relative(result.sumDragArea, handDragArea)).toBeLessThan(1e-9);
    expect(relative(result.totalDrag, handDrag)).toBeLessThan(1e-9);
    sections.forEach(({ length, diameter }, i) => {
      const part = result.parts[i];
      expect(part?.referenceArea).toBeCloseTo(length * diameter, 12); // rule: L·d, not πd²/4
      expect(relative(part?.reynoldsNumber ?? 0, (AIR.density * speed * diameter) / AIR.viscosity)).toBeLessThan(1e-9);
      expect(part?.warnings).toEqual([]);
    });
    const shares = result.parts.reduce((sum, part) => sum + part.dragShare, 0);
    expect(relative(shares, 1)).toBeLessThan(1e-12);
  });

  it('applies the interference factor to the total and states it as an assumption', () => {
    const parts = [{ label: 'fairing', dragArea: 0.2 }, { shapeId: 'cube-flat-on', dimensions: { side: 0.3 }, count: 2 }];
    const plain = buildUpDrag(parts, { speed: 20, ...AIR });
    const interfered = buildUpDrag(parts, { speed: 20, ...AIR, interferenceFactor: 1.15 });
    // Munson Fig. 9.20: cube C_D = 1.05 on side²; two cubes: 2 × 1.05 × 0.09 = 0.189 m²; fairing 0.2 m².
    expect(relative(plain.sumDragArea, 0.389)).toBeLessThan(1e-12);
    expect(relative(interfered.totalDragArea, 0.389 * 1.15)).toBeLessThan(1e-12);
    expect(relative(interfered.totalDrag, 0.5 * 1.225 * 400 * 0.389 * 1.15)).toBeLessThan(1e-12);
    expect(interfered.assumptions.join(' ')).toMatch(/1\.15/);
    expect(interfered.caution).toBe(PLANNER_CAUTION);
  });

  it('warns with a code when Re is below the range the source states', () => {
    // Munson Fig. 9.20: cube value holds for Re > 1e4; a 1 cm cube at 1 m/s has Re ≈ 685.
    const result = buildUpDrag([{ shapeId: 'cube', orientation: 'flat-on', dimensions: { side: 0.01 }, count: 1 }], { speed: 1, ...AIR });
    expect(result.parts[0]?.warnings.map((w) => w.code)).toEqual(['RE_BELOW_RANGE']);
    expect(result.parts[0]?.warnings[0]?.message).toMatch(/below/);
  });

  it('holds a curve at its range end and warns when Re is above the curve range', () => {
    // cylinderDragWhite range 1…2e5 (reference-curves); a 1 m cylinder at 10 m/s has Re ≈ 6.85e5.
    const result = buildUpDrag([{ shapeId: 'circular-cylinder-cross-flow', dimensions: { length: 1, diameter: 1 }, count: 1 }], {
      speed: 10,
      ...AIR,
    });
    expect(result.parts[0]?.warnings.map((w) => w.code)).toEqual(['RE_ABOVE_RANGE']);
    expect(relative(result.parts[0]?.dragCoefficient ?? 0, whiteCylinder(2e5))).toBeLessThan(1e-12); // held at Re = 2e5
  });

  it('uses the typical frontal area of a whole object unless one is given', () => {
    const typical = buildUpDrag([{ shapeId: 'rider-racing', dimensions: {}, count: 1 }], { speed: 10, ...AIR });
    // Munson bicycle entries: racing C_D = 0.88 on 0.36 m² → C_D·A = 0.3168 m².
    expect(relative(typical.totalDragArea, 0.3168)).toBeLessThan(1e-12);
    expect(typical.parts[0]?.warnings.map((w) => w.code)).toEqual(['RE_RANGE_NOT_STATED']);
    const measured = buildUpDrag([{ shapeId: 'rider-racing', dimensions: { frontalArea: 0.4 }, count: 1 }], { speed: 10, ...AIR });
    expect(relative(measured.totalDragArea, 0.352)).toBeLessThan(1e-12); // 0.88 × 0.4
  });

  it.each([
    ['positive speed', { speed: 0 }],
    ['finite density', { density: Number.NaN }],
    ['finite viscosity', { viscosity: Number.POSITIVE_INFINITY }],
    ['positive interference factor', { interferenceFactor: -1 }],
  ])('rejects a bad %s', (name, override) => {
    expect(() => buildUpDrag([{ label: 'x', dragArea: 1 }], { speed: 10, ...AIR, ...override })).toThrow(
      new RegExp(`^.buildUpDrag. requires a ${name}`),
    );
  });

  it('rejects an empty build-up, a fractional count and an unknown shape', () => {
    expect(() => buildUpDrag([], { speed: 10, ...AIR })).toThrow(/`buildUpDrag` requires at least one part/);
    expect(() => buildUpDrag([{ shapeId: 'sphere', dimensions: { diameter: 1 }, count: 1.5 }], { speed: 10, ...AIR })).toThrow(
      /whole-number count/,
    );
    expect(() => buildUpDrag([{ shapeId: 'teapot', dimensions: {}, count: 1 }], { speed: 10, ...AIR })).toThrow(/`findShape` requires a known shape id/);
  });
});
