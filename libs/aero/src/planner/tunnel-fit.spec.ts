import { describe, expect, it } from 'vitest';
import { buildUpDrag } from './build-up-drag';
import { machCheck } from './mach-check';
import { PLANNER_CAUTION } from './planner-caution';
import { tunnelFit, type TunnelFitInput } from './tunnel-fit';

const below = (x: number): number => x - x * Number.EPSILON;
const above = (x: number): number => x + x * Number.EPSILON;
const statusOf = (result: ReturnType<typeof tunnelFit>, id: string): string | undefined =>
  result.checks.find((check) => check.id === id)?.status;

// Exact binary numbers so each threshold is met exactly: ρ = 2 kg/m³ and V = 1 m/s give q = ½·2·1² = 1 Pa.
const unitArticle = (frontalArea: number) =>
  buildUpDrag([{ label: 'block', dragArea: 1, frontalArea }], { speed: 1, density: 2, viscosity: 1.8e-5 });

const fit = (overrides: Partial<TunnelFitInput> & { capacity?: number; frontalArea?: number }) =>
  tunnelFit({
    buildUp: unitArticle(overrides.frontalArea ?? 0.01),
    tunnel: { kind: 'closed-section', sectionArea: 1, maxSpeed: 200, capacities: { drag: overrides.capacity ?? 100 }, speedOfSound: 340 },
    scale: 1,
    speeds: [1],
    yawMargin: 0,
    ...overrides,
  });

describe('tunnelFit', () => {
  it('switches blockage pass → warn at 7.5 % and warn → fail just above 10 % of the section', () => {
    // Thresholds: Barlow, Rae & Pope 1999 rules of thumb (attribution from memory).
    expect(statusOf(fit({ frontalArea: below(0.075) }), 'blockage')).toBe('pass');
    expect(statusOf(fit({ frontalArea: 0.075 }), 'blockage')).toBe('warn');
    expect(statusOf(fit({ frontalArea: 0.1 }), 'blockage')).toBe('warn');
    expect(statusOf(fit({ frontalArea: above(0.1) }), 'blockage')).toBe('fail');
  });

  it('scales the frontal area by λ²', () => {
    // 0.3 m² full scale at λ = 0.5 → 0.075 m² model: exactly the warn threshold.
    const result = fit({ frontalArea: 0.3, scale: 0.5 });
    expect(result.modelFrontalArea).toBe(0.075);
    expect(statusOf(result, 'blockage')).toBe('warn');
  });

  it('switches the capacity check pass → warn at 80 % and warn → fail just above 100 %', () => {
    // Load = q·C_D·A = 1 N; thresholds our choice (common practice).
    expect(statusOf(fit({ capacity: above(1.25) }), 'load-drag-1')).toBe('pass');
    expect(statusOf(fit({ capacity: 1.25 }), 'load-drag-1')).toBe('warn'); // 1 / 1.25 = 0.8
    expect(statusOf(fit({ capacity: 1 }), 'load-drag-1')).toBe('warn');
    expect(statusOf(fit({ capacity: below(1) }), 'load-drag-1')).toBe('fail');
  });

  it('adds the yaw margin to the predicted load', () => {
    const result = fit({ capacity: 1.25, yawMargin: 0.25 });
    expect(result.loads[0]?.drag).toBe(1.25); // 1 N × (1 + 0.25)
    expect(statusOf(result, 'load-drag-1')).toBe('warn'); // exactly 100 % of capacity
  });

  it('switches Mach pass → warn just above 0.3 and warn → fail just above 0.4', () => {
    // a = 340 m/s: 102 m/s is M = 0.3 and 136 m/s is M = 0.4 (definition M = V/a).
    expect(statusOf(fit({ speeds: [102] }), 'mach')).toBe('pass');
    expect(statusOf(fit({ speeds: [above(102)] }), 'mach')).toBe('warn');
    expect(statusOf(fit({ speeds: [136] }), 'mach')).toBe('warn');
    expect(statusOf(fit({ speeds: [above(136)] }), 'mach')).toBe('fail');
    expect(machCheck(102, 340).value).toBe(0.3);
  });

  it('fails a planned speed above the tunnel maximum', () => {
    const result = tunnelFit({
      buildUp: unitArticle(0.01),
      tunnel: { kind: 'closed-section', sectionArea: 1, maxSpeed: 40, capacities: { drag: 1e6 }, speedOfSound: 340 },
      scale: 1,
      speeds: [40, 41],
      yawMargin: 0,
    });
    expect(statusOf(result, 'speed-40')).toBe('pass');
    expect(statusOf(result, 'speed-41')).toBe('fail');
    expect(result.overall).toBe('fail');
  });

  it('compares each part\'s model Reynolds number with full scale', () => {
    const fullScale = buildUpDrag(
      [
        { shapeId: 'sphere', dimensions: { diameter: 0.5 }, count: 1 },
        { shapeId: 'square-plate-normal', dimensions: { side: 1 }, count: 1 },
      ],
      { speed: 20, density: 1.225, viscosity: 1.7894e-5 },
    );
    const result = tunnelFit({
      buildUp: fullScale,
      tunnel: { kind: 'closed-section', sectionArea: 4, maxSpeed: 50, capacities: { drag: 1e4 }, speedOfSound: 340 },
      scale: 0.25,
      speeds: [20, 40],
      yawMargin: 0.2,
    });
    const sphere = result.checks.find((check) => check.id === 'reynolds-0');
    const plate = result.checks.find((check) => check.id === 'reynolds-1');
    // Model Re / full-scale Re = λ × V_model / V_full = 0.25 × 40 / 20 = 0.5 (definition, same air).
    expect(Math.abs((sphere?.value ?? 0) - 0.5) / 0.5).toBeLessThan(1e-12);
    expect(sphere?.status).toBe('warn'); // rounded body below full-scale Re
    expect(plate?.status).toBe('pass'); // sharp-edged, model Re ≈ 6.8e5 ≥ 1e4
    expect(result.caution).toBe(PLANNER_CAUTION);
  });

  it('rejects a bad scale, yaw margin or an empty speed list', () => {
    expect(() => fit({ scale: 0 })).toThrow(/`tunnelFit` requires a positive scale/);
    expect(() => fit({ yawMargin: -0.1 })).toThrow(/`tunnelFit` requires a non-negative yaw margin/);
    expect(() => fit({ speeds: [] })).toThrow(/`tunnelFit` requires at least one planned speed/);
  });
});
