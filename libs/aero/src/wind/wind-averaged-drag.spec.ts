import { describe, expect, it } from 'vitest';
import { AeroInputError } from '../errors/aero-input-error';
import { degreesToRadians } from '../units/angles';
import { relativeWind } from './relative-wind';
import { windAveragedDragCoefficient } from './wind-averaged-drag-coefficient';
import { windAveragedFromYawSweep } from './wind-averaged-from-yaw-sweep';
import { J1252_VEHICLE_SPEED, J1252_WIND_SPEED } from './wind-averaging-options';
import { yawSweepInterpolator } from './yaw-sweep-interpolator';

/** An invented symmetric yaw curve: C_D rises with the square of yaw. */
const quadratic = (yaw: number) => 0.55 + 2 * yaw * yaw;

describe('windAveragedDragCoefficient', () => {
  it('uses 55 mph and 7 mph by default', () => {
    // SAE J1252 — from memory: V = 55 mph, V_w = 7 mph; 1 mph = 0.44704 m/s (NIST SP 811 App. B, exact).
    expect(J1252_VEHICLE_SPEED).toBeCloseTo(24.5872, 12);
    expect(J1252_WIND_SPEED).toBeCloseTo(3.12928, 12);
  });

  it('gives C_D·(1 + (V_w/V)²) for a constant C_D', () => {
    // SAE J1252 — from memory: with constant C_D, (1/π)∫(V_r/V)²dφ = 1 + (V_w/V)² because ∫₀^π cos φ dφ = 0;
    // 0.5·(1 + (7/55)²) = 0.508099, ±1e-12 relative.
    expect(Math.abs(windAveragedDragCoefficient(() => 0.5) / (0.5 * (1 + (7 / 55) ** 2)) - 1)).toBeLessThan(1e-12);
    const custom = windAveragedDragCoefficient(() => 0.3, { vehicleSpeed: 20, windSpeed: 5, steps: 40 });
    expect(Math.abs(custom / (0.3 * (1 + 0.0625)) - 1)).toBeLessThan(1e-12);
  });

  it('equals the full-circle average for a left–right symmetric C_D', () => {
    // Symmetry: for C_D(−ψ) = C_D(ψ), uniform φ over 0…2π gives the same mean as over 0…π (SAE J1252 — from memory).
    // Independent check: a plain midpoint sum over the whole circle with 200 000 points, ±1e-9 relative.
    const n = 200_000;
    let sum = 0;
    for (let i = 0; i < n; i++) {
      const { airspeed, yawAngle } = relativeWind({ groundSpeed: J1252_VEHICLE_SPEED, windSpeed: J1252_WIND_SPEED, windDirection: ((i + 0.5) * 2 * Math.PI) / n });
      sum += quadratic(yawAngle) * (airspeed / J1252_VEHICLE_SPEED) ** 2;
    }
    expect(Math.abs(windAveragedDragCoefficient(quadratic) / (sum / n) - 1)).toBeLessThan(1e-9);
  });

  it('raises the average above the constant-C_D value when drag grows with yaw', () => {
    expect(windAveragedDragCoefficient(quadratic)).toBeGreaterThan(0.55 * (1 + (7 / 55) ** 2));
  });

  it('converges: 720 and 7200 steps agree to 1e-10', () => {
    const coarse = windAveragedDragCoefficient(quadratic);
    const fine = windAveragedDragCoefficient(quadratic, { steps: 7200 });
    expect(Math.abs(coarse / fine - 1)).toBeLessThan(1e-10);
  });

  it('is exactly the C_D with no wind', () => {
    expect(windAveragedDragCoefficient(() => 0.4, { windSpeed: 0 })).toBeCloseTo(0.4, 14);
  });

  it('rejects NaN from the curve, infinity and zero speeds, odd steps', () => {
    expect(() => windAveragedDragCoefficient(() => Number.NaN)).toThrow(/finite drag coefficient at every yaw; got NaN/);
    expect(() => windAveragedDragCoefficient(() => 0.5, { vehicleSpeed: Number.POSITIVE_INFINITY })).toThrow(AeroInputError);
    expect(() => windAveragedDragCoefficient(() => 0.5, { vehicleSpeed: 0 })).toThrow(/positive vehicle speed; got 0 m\/s/);
    expect(() => windAveragedDragCoefficient(() => 0.5, { steps: 7 })).toThrow(/even whole number of steps/);
  });
});

describe('windAveragedFromYawSweep', () => {
  const yaws = [0, 2, 4, 6, 8, 10].map(degreesToRadians);
  const linear = (yaw: number) => 0.5 + 0.8 * Math.abs(yaw);

  it('matches the function form for a sweep it can interpolate exactly', () => {
    // Linear interpolation reproduces a linear C_D(|ψ|) exactly, so both integrals agree to round-off (1e-12).
    const sweep = yaws.map((yawAngle) => ({ yawAngle, dragCoefficient: linear(yawAngle) }));
    expect(Math.abs(windAveragedFromYawSweep(sweep) / windAveragedDragCoefficient(linear) - 1)).toBeLessThan(1e-12);
  });

  it('mirrors a one-sided sweep and averages a two-sided one', () => {
    const positive = yaws.map((yawAngle) => ({ yawAngle, dragCoefficient: linear(yawAngle) }));
    const negative = yaws.map((yawAngle) => ({ yawAngle: -yawAngle, dragCoefficient: linear(yawAngle) }));
    expect(windAveragedFromYawSweep(negative)).toBeCloseTo(windAveragedFromYawSweep(positive), 14);
    expect(yawSweepInterpolator(negative).mirrored).toBe(true);
    // An asymmetric model: C_D higher by 0.1·|ψ| on the positive side and lower by as much on the negative side
    // (one shared point at ψ = 0); averaging the two sides cancels the asymmetry.
    const asymmetric = [
      ...positive.map((p) => ({ ...p, dragCoefficient: p.dragCoefficient + 0.1 * p.yawAngle })),
      ...negative.slice(1).map((p) => ({ ...p, dragCoefficient: p.dragCoefficient + 0.1 * p.yawAngle })),
    ];
    expect(Math.abs(windAveragedFromYawSweep(asymmetric) / windAveragedFromYawSweep(positive) - 1)).toBeLessThan(1e-12);
  });

  it('averages repeat points at one yaw', () => {
    const sweep = [
      { yawAngle: 0, dragCoefficient: 0.49 },
      { yawAngle: 0, dragCoefficient: 0.51 },
      { yawAngle: degreesToRadians(10), dragCoefficient: 0.5 },
    ];
    expect(Math.abs(windAveragedFromYawSweep(sweep) / (0.5 * (1 + (7 / 55) ** 2)) - 1)).toBeLessThan(1e-12);
  });

  it('says how far the sweep must reach when it stops short', () => {
    // ψ_max = asin(7/55) = 7.31° (relative-wind geometry) but the sweep stops at 6°.
    const short = yaws.slice(0, 4).map((yawAngle) => ({ yawAngle, dragCoefficient: 0.5 }));
    expect(() => windAveragedFromYawSweep(short)).toThrow(/from 0° to at least 7.31°.*covers 0° to 6.00°/);
    expect(() => windAveragedFromYawSweep(short)).toThrow(expect.objectContaining({ code: 'NOT_COVERED' }));
  });

  it('needs the zero-yaw point and a sweep on both sides to reach ψ_max', () => {
    const noZero = yaws.slice(1).map((yawAngle) => ({ yawAngle, dragCoefficient: 0.5 }));
    expect(() => windAveragedFromYawSweep(noZero)).toThrow(/no range starting at 0°/);
    const lopsided = [...yaws.map((yawAngle) => ({ yawAngle, dragCoefficient: 0.5 })), { yawAngle: degreesToRadians(-2), dragCoefficient: 0.5 }];
    expect(() => windAveragedFromYawSweep(lopsided)).toThrow(/covers 0° to 2.00° on both sides/);
  });

  it('rejects no points, NaN and infinity', () => {
    expect(() => windAveragedFromYawSweep([])).toThrow(expect.objectContaining({ code: 'EMPTY_INPUT' }));
    expect(() => windAveragedFromYawSweep([{ yawAngle: Number.NaN, dragCoefficient: 0.5 }])).toThrow(/yaw angle at point 0; got NaN rad/);
    expect(() => windAveragedFromYawSweep([{ yawAngle: 0, dragCoefficient: Number.POSITIVE_INFINITY }])).toThrow(AeroInputError);
  });
});

describe('yawSweepInterpolator', () => {
  it('interpolates linearly and refuses yaw outside the sweep', () => {
    const sweep = yawSweepInterpolator([{ yawAngle: 0.2, dragCoefficient: 0.6 }, { yawAngle: 0, dragCoefficient: 0.5 }]);
    expect(sweep.dragCoefficientAtYaw(0.1)).toBeCloseTo(0.55, 15);
    expect(sweep.dragCoefficientAtYaw(-0.1)).toBeCloseTo(0.55, 15);
    expect(sweep.coveredYawAngle).toBe(0.2);
    expect(() => sweep.dragCoefficientAtYaw(0.3)).toThrow(/inside the measured sweep/);
    expect(() => sweep.dragCoefficientAtYaw(Number.NaN)).toThrow(expect.objectContaining({ code: 'NOT_COVERED' }));
  });
});
