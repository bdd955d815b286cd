import { describe, expect, it } from 'vitest';
import { findShape } from '../shapes';
import { fullScalePower } from './full-scale-power';
import { headTailPowerSeries } from './head-tail-power-series';
import { PLANNER_CAUTION } from './planner-caution';

const relative = (actual: number, expected: number): number => Math.abs(actual - expected) / Math.abs(expected);

// Munson et al., bicycle entries: racing rider C_D = 0.88 on 0.36 m² → C_D·A = 0.3168 m². ISA sea level ρ = 1.225 kg/m³.
const racing = findShape('rider-racing');
const RACING_DRAG_AREA = (racing.dragCoefficient as number) * (racing.typicalFrontalArea ?? Number.NaN);
const DENSITY = 1.225;

describe('fullScalePower', () => {
  it('uses the cited racing-rider drag area', () => {
    expect(relative(RACING_DRAG_AREA, 0.3168)).toBeLessThan(1e-12); // 0.88 × 0.36
  });

  it('gives (14/6)² ≈ 5.444 for both drag and power: 10 m/s into a 4 m/s headwind vs with a 4 m/s tailwind', () => {
    const head = fullScalePower({ dragArea: RACING_DRAG_AREA, density: DENSITY, groundSpeed: 10, windSpeed: 4, windDirection: 0 });
    const tail = fullScalePower({ dragArea: RACING_DRAG_AREA, density: DENSITY, groundSpeed: 10, windSpeed: 4, windDirection: Math.PI });
    const expected = (14 / 6) ** 2; // definition: drag ∝ V_r², V_r = 10 ± 4 m/s; power = drag × the same ground speed
    expect(relative(head.drag / tail.drag, expected)).toBeLessThan(1e-12);
    expect(relative(head.power / tail.power, expected)).toBeLessThan(1e-12);
    expect(relative(expected, 5.444)).toBeLessThan(1e-4);
    // Absolute values: ½ × 1.225 × 14² × 0.3168 = 38.03 N, × 10 m/s = 380.3 W; ½ × 1.225 × 6² × 0.3168 = 6.985 N, 69.85 W.
    expect(relative(head.drag, 38.031)).toBeLessThan(1e-4);
    expect(relative(head.power, 380.31)).toBeLessThan(1e-4);
    expect(relative(tail.drag, 6.9854)).toBeLessThan(1e-4);
    expect(relative(tail.power, 69.854)).toBeLessThan(1e-4);
    expect(head.caution).toBe(PLANNER_CAUTION);
  });

  it('shows a drafting rider needs 0.50 / 0.88 of the leading rider\'s power at the same speed', () => {
    // Munson et al., bicycle entries: drafting C_D = 0.50 vs racing (leading) 0.88, both on 0.36 m².
    const drafting = findShape('rider-drafting');
    const draftingArea = (drafting.dragCoefficient as number) * (drafting.typicalFrontalArea ?? Number.NaN);
    const lead = fullScalePower({ dragArea: RACING_DRAG_AREA, density: DENSITY, groundSpeed: 12, windSpeed: 0, windDirection: 0 });
    const behind = fullScalePower({ dragArea: draftingArea, density: DENSITY, groundSpeed: 12, windSpeed: 0, windDirection: 0 });
    expect(drafting.dragCoefficient).toBe(0.5); // Munson et al., bicycle entries: drafting 0.50
    expect(racing.dragCoefficient).toBe(0.88); // Munson et al., bicycle entries: racing 0.88
    expect(relative(behind.power / lead.power, 0.5 / 0.88)).toBeLessThan(1e-12);
  });
});

describe('headTailPowerSeries', () => {
  const series = headTailPowerSeries({ dragArea: RACING_DRAG_AREA, density: DENSITY, groundSpeed: 10, windSpeeds: [0, 4, 10, 12] });

  it('is symmetric in still air', () => {
    const still = series.points[0];
    expect(still?.headwind.power).toBe(still?.tailwind?.power);
  });

  it('matches fullScalePower at 4 m/s', () => {
    const point = series.points[1];
    expect(relative((point?.headwind.power ?? 0) / (point?.tailwind?.power ?? 1), (14 / 6) ** 2)).toBeLessThan(1e-12); // definition
  });

  it('has no tailwind point once the tailwind reaches the ground speed', () => {
    expect(series.points[2]?.tailwind).toBeNull(); // V_r = 10 − 10 = 0: no air from ahead
    expect(series.points[3]?.tailwind).toBeNull(); // air from behind
    expect(series.points[2]?.headwind.airspeed).toBeCloseTo(20, 12); // 10 + 10
    expect(series.points[3]?.headwind.airspeed).toBeCloseTo(22, 12); // 10 + 12
    expect(series.caution).toBe(PLANNER_CAUTION);
  });

  it('rejects an empty wind list and a zero ground speed', () => {
    expect(() => headTailPowerSeries({ dragArea: 0.3, density: 1.2, groundSpeed: 10, windSpeeds: [] })).toThrow(
      /`headTailPowerSeries` requires at least one wind speed/,
    );
    expect(() => headTailPowerSeries({ dragArea: 0.3, density: 1.2, groundSpeed: 0, windSpeeds: [1] })).toThrow(
      /`headTailPowerSeries` requires a positive ground speed/,
    );
  });
});
