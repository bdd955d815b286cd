import { describe, expect, it } from 'vitest';
import { blockageCheck } from './blockage-check';
import { BLOCKAGE_FAIL_RATIO, BLOCKAGE_WARN_RATIO, CAPACITY_WARN_FRACTION } from './fit-thresholds';
import { loadCheck } from './load-check';
import { reynoldsCheck } from './reynolds-check';
import { speedLimitCheck } from './speed-limit-check';

// Numbers just either side of a threshold: one unit in the last place away.
const below = (x: number): number => x - x * Number.EPSILON;
const above = (x: number): number => x + x * Number.EPSILON;

describe('blockageCheck', () => {
  // Thresholds: Barlow, Rae & Pope (1999) rules of thumb, 7.5 % warn and 10 % fail (attribution from memory).
  it('passes just below 7.5 %, warns at exactly 7.5 %', () => {
    expect(blockageCheck({ modelFrontalArea: below(0.075), sectionArea: 1 }).status).toBe('pass');
    expect(blockageCheck({ modelFrontalArea: 0.075, sectionArea: 1 }).status).toBe('warn');
  });

  it('warns at exactly 10 %, fails just above it', () => {
    expect(blockageCheck({ modelFrontalArea: 0.1, sectionArea: 1 }).status).toBe('warn');
    expect(blockageCheck({ modelFrontalArea: above(0.1), sectionArea: 1 }).status).toBe('fail');
  });

  it('reports the ratio as its value', () => {
    const check = blockageCheck({ modelFrontalArea: 0.15, sectionArea: 2 });
    expect(Math.abs((check.value ?? 0) - 0.075) / 0.075).toBeLessThan(1e-12); // definition: 0.15 / 2
    expect(check.id).toBe('blockage');
    // Barlow, Rae & Pope 1999 ch. 10 shortcut ε = ¼·A/C = 0.01875; (1 + ε)² = 1.0379 → "1.038".
    expect(check.reason).toContain('1.038');
  });

  it('exports the thresholds it applies', () => {
    expect(BLOCKAGE_WARN_RATIO).toBe(0.075); // Barlow, Rae & Pope 1999 (from memory)
    expect(BLOCKAGE_FAIL_RATIO).toBe(0.1); // Barlow, Rae & Pope 1999 (from memory)
  });

  it('warns when some frontal areas are unknown, even at low blockage', () => {
    const check = blockageCheck({ modelFrontalArea: 0.01, sectionArea: 1, uncountedParts: ['fairing'] });
    expect(check.status).toBe('warn');
    expect(check.reason).toContain('fairing');
  });

  it.each([0, Number.NaN, Number.POSITIVE_INFINITY])('rejects a section area of %f', (sectionArea) => {
    expect(() => blockageCheck({ modelFrontalArea: 0.1, sectionArea })).toThrow(/`blockageCheck` requires/);
  });
});

describe('loadCheck', () => {
  // Thresholds: our choice (common practice), warn at ≥ 80 % of capacity, fail above 100 %.
  it('passes just below 80 %, warns at exactly 80 %', () => {
    expect(loadCheck({ speed: 30, load: below(80), capacity: 100, component: 'drag' }).status).toBe('pass');
    expect(loadCheck({ speed: 30, load: 80, capacity: 100, component: 'drag' }).status).toBe('warn');
  });

  it('warns at exactly 100 %, fails just above it', () => {
    expect(loadCheck({ speed: 30, load: 100, capacity: 100, component: 'drag' }).status).toBe('warn');
    expect(loadCheck({ speed: 30, load: above(100), capacity: 100, component: 'drag' }).status).toBe('fail');
  });

  it('names the component and speed', () => {
    const check = loadCheck({ speed: 25, load: 10, capacity: 100, component: 'drag' });
    expect(check.id).toBe('load-drag-25');
    expect(Math.abs((check.value ?? 0) - 0.1) / 0.1).toBeLessThan(1e-12); // definition: 10 / 100
    expect(CAPACITY_WARN_FRACTION).toBe(0.8);
  });

  it.each([
    [Number.NaN, 100],
    [-1, 100],
    [10, 0],
    [10, Number.POSITIVE_INFINITY],
  ])('rejects load %f against capacity %f', (load, capacity) => {
    expect(() => loadCheck({ speed: 1, load, capacity, component: 'drag' })).toThrow(/`loadCheck` requires/);
  });
});

describe('speedLimitCheck', () => {
  it('passes at exactly the maximum and fails just above', () => {
    expect(speedLimitCheck(50, 50).status).toBe('pass');
    expect(speedLimitCheck(above(50), 50).status).toBe('fail');
  });

  it.each([0, Number.NaN])('rejects a speed of %f', (speed) => {
    expect(() => speedLimitCheck(speed, 50)).toThrow(/`speedLimitCheck` requires/);
  });
});

describe('reynoldsCheck', () => {
  const base = { index: 2, label: 'mast' } as const;

  it('passes a rounded part that reaches full-scale Re, and warns just below', () => {
    expect(reynoldsCheck({ ...base, edges: 'rounded', modelReynolds: 2e5, fullScaleReynolds: 2e5 }).status).toBe('pass');
    const short = reynoldsCheck({ ...base, edges: 'rounded', modelReynolds: below(2e5), fullScaleReynolds: 2e5 });
    expect(short.status).toBe('warn');
    expect(short.reason).toMatch(/drag crisis/);
  });

  it('passes a sharp-edged part at Re = 1e4 far below full scale, and warns just below 1e4', () => {
    // Sharp-edged C_D largely Re-independent above ~1e4 (from memory).
    const pass = reynoldsCheck({ ...base, edges: 'sharp', modelReynolds: 1e4, fullScaleReynolds: 1e7 });
    expect(pass.status).toBe('pass');
    expect(Math.abs((pass.value ?? 0) - 1e-3) / 1e-3).toBeLessThan(1e-12); // definition: 1e4 / 1e7
    expect(reynoldsCheck({ ...base, edges: 'sharp', modelReynolds: below(1e4), fullScaleReynolds: 1e7 }).status).toBe('warn');
  });

  it('warns that Re was not checked when a part has no length', () => {
    const check = reynoldsCheck({ ...base, edges: null, modelReynolds: null, fullScaleReynolds: null });
    expect(check).toMatchObject({ id: 'reynolds-2', status: 'warn' });
  });

  it('rejects a non-positive Reynolds number', () => {
    expect(() => reynoldsCheck({ ...base, edges: 'sharp', modelReynolds: 0, fullScaleReynolds: 1 })).toThrow(/`reynoldsCheck` requires/);
  });
});
