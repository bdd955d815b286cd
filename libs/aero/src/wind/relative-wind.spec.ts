import { describe, expect, it } from 'vitest';
import { AeroInputError } from '../errors/aero-input-error';
import { degreesToRadians, radiansToDegrees } from '../units/angles';
import { MILE_PER_HOUR } from '../units/nist-constants';
import { fullScaleDragAndPower } from './full-scale-drag-and-power';
import { maximumYawAngle } from './maximum-yaw-angle';
import { relativeWind } from './relative-wind';

describe('relativeWind', () => {
  it('reproduces the 40 CFR 1037.528 example: 7.1 mph at 47° on 64.9 mph → 69.93 mph, 4.26°', () => {
    // 40 CFR 1037.528 worked example. Vector addition of the printed inputs gives 69.9352 mph and 4.258°; the
    // printed 69.93 mph sits 0.0052 mph below, well inside what rounding the inputs to 0.1 mph allows (±0.05 mph on
    // each input moves v_air by up to ±0.09 mph), so the airspeed is compared to ±0.01 mph and the yaw to ±0.005°.
    const wind = relativeWind({ groundSpeed: 64.9 * MILE_PER_HOUR, windSpeed: 7.1 * MILE_PER_HOUR, windDirection: degreesToRadians(47) });
    expect(Math.abs(wind.airspeed / MILE_PER_HOUR - 69.93)).toBeLessThan(0.01);
    expect(Math.abs(radiansToDegrees(wind.yawAngle) - 4.26)).toBeLessThan(0.005);
  });

  it('adds a headwind, subtracts a tailwind and combines a crosswind at right angles', () => {
    // Vector addition (definition): 10 + 3 = 13, 10 − 3 = 7, √(10² + 3²) at atan(3/10).
    expect(relativeWind({ groundSpeed: 10, windSpeed: 3, windDirection: 0 })).toEqual({ airspeed: 13, yawAngle: 0 });
    expect(relativeWind({ groundSpeed: 10, windSpeed: 3, windDirection: Math.PI }).airspeed).toBeCloseTo(7, 14);
    const cross = relativeWind({ groundSpeed: 10, windSpeed: 3, windDirection: Math.PI / 2 });
    expect(Math.abs(cross.airspeed / Math.sqrt(109) - 1)).toBeLessThan(1e-15);
    expect(Math.abs(cross.yawAngle / Math.atan(0.3) - 1)).toBeLessThan(1e-15);
  });

  it('gives the yaw the sign of sin φ', () => {
    const left = relativeWind({ groundSpeed: 10, windSpeed: 3, windDirection: -Math.PI / 2 });
    expect(left.yawAngle).toBeCloseTo(-Math.atan(0.3), 15);
  });

  it('gives zero air with no motion', () => {
    expect(relativeWind({ groundSpeed: 0, windSpeed: 0, windDirection: 0 })).toEqual({ airspeed: 0, yawAngle: 0 });
  });

  it('rejects NaN, infinity and negative speeds', () => {
    expect(() => relativeWind({ groundSpeed: Number.NaN, windSpeed: 3, windDirection: 0 })).toThrow(AeroInputError);
    expect(() => relativeWind({ groundSpeed: 10, windSpeed: 3, windDirection: Number.POSITIVE_INFINITY })).toThrow(/finite wind direction; got Infinity rad/);
    expect(() => relativeWind({ groundSpeed: 10, windSpeed: -3, windDirection: 0 })).toThrow(/non-negative wind speed/);
  });
});

describe('fullScaleDragAndPower', () => {
  const BASE = { dragArea: 0.25, density: 1.2, groundSpeed: 10, windSpeed: 3 };

  it('gives 25.35 N and 253.5 W into a 3 m/s headwind', () => {
    // Definition D = ½ρV_r²·CdA, P = D·V_ground: ½·1.2·13²·0.25 = 25.35 N, ×10 m/s = 253.5 W (exact to 1e-14).
    const result = fullScaleDragAndPower({ ...BASE, windDirection: 0 });
    expect(Math.abs(result.drag / 25.35 - 1)).toBeLessThan(1e-14);
    expect(Math.abs(result.power / 253.5 - 1)).toBeLessThan(1e-14);
  });

  it('gives 7.35 N and 73.5 W with a 3 m/s tailwind', () => {
    // Definition: ½·1.2·7²·0.25 = 7.35 N, ×10 m/s = 73.5 W (exact to 1e-14).
    const result = fullScaleDragAndPower({ ...BASE, windDirection: Math.PI });
    expect(Math.abs(result.drag / 7.35 - 1)).toBeLessThan(1e-14);
    expect(Math.abs(result.power / 73.5 - 1)).toBeLessThan(1e-14);
  });

  it('gives zero drag and power with no motion', () => {
    expect(fullScaleDragAndPower({ ...BASE, groundSpeed: 0, windSpeed: 0, windDirection: 0 })).toMatchObject({ drag: 0, power: 0 });
  });

  it('refuses air overtaking the vehicle from behind', () => {
    expect(() => fullScaleDragAndPower({ ...BASE, groundSpeed: 2, windSpeed: 5, windDirection: Math.PI })).toThrow(/approaching from ahead/);
  });

  it('rejects NaN, infinity and zero drag area', () => {
    expect(() => fullScaleDragAndPower({ ...BASE, windDirection: 0, dragArea: Number.NaN })).toThrow(AeroInputError);
    expect(() => fullScaleDragAndPower({ ...BASE, windDirection: 0, density: Number.POSITIVE_INFINITY })).toThrow(/finite density/);
    expect(() => fullScaleDragAndPower({ ...BASE, windDirection: 0, dragArea: 0 })).toThrow(/`fullScaleDragAndPower` requires a positive drag area; got 0 m²/);
  });
});

describe('maximumYawAngle', () => {
  it('is asin(V_w/V) below V, 90° at V and 180° above', () => {
    // Relative-wind triangle geometry (common practice): asin(7/55) = 7.3115° (hand arithmetic).
    expect(Math.abs(radiansToDegrees(maximumYawAngle(55, 7)) / 7.3115 - 1)).toBeLessThan(1e-4);
    expect(maximumYawAngle(5, 5)).toBe(Math.PI / 2);
    expect(maximumYawAngle(5, 6)).toBe(Math.PI);
    expect(maximumYawAngle(5, 0)).toBe(0);
  });

  it('rejects NaN, infinity and zero vehicle speed', () => {
    expect(() => maximumYawAngle(Number.NaN, 1)).toThrow(AeroInputError);
    expect(() => maximumYawAngle(5, Number.POSITIVE_INFINITY)).toThrow(/finite wind speed/);
    expect(() => maximumYawAngle(0, 1)).toThrow(/positive vehicle speed/);
  });
});
