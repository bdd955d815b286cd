import { describe, expect, it } from 'vitest';
import { AeroInputError } from '../errors/aero-input-error';
import { ISA_GAS_CONSTANT, ISA_SEA_LEVEL } from './isa-sea-level';
import { kinematicViscosity } from './kinematic-viscosity';
import { speedOfSound } from './speed-of-sound';
import {
  SUTHERLAND_REFERENCE_TEMPERATURE,
  SUTHERLAND_REFERENCE_VISCOSITY,
  SUTHERLAND_TEMPERATURE,
  sutherlandViscosity,
} from './sutherland-viscosity';

describe('sutherlandViscosity', () => {
  it.each([
    // US Standard Atmosphere 1976 — from memory: μ at 288.15 / 293.15 / 273.15 K, ±1e-4 relative.
    [288.15, 1.78938e-5],
    [293.15, 1.81341e-5],
    [273.15, 1.71608e-5],
  ])('μ(%d K) = %d Pa·s', (temperature, expected) => {
    expect(Math.abs(sutherlandViscosity(temperature) / expected - 1)).toBeLessThan(1e-4);
  });

  it('matches the equivalent μ_ref = 1.716e-5 Pa·s at 273.15 K, S = 110.4 K form', () => {
    // US Standard Atmosphere 1976 — from memory: the two forms agree to 1e-4 at any temperature.
    const reference = (t: number) =>
      SUTHERLAND_REFERENCE_VISCOSITY * (t / SUTHERLAND_REFERENCE_TEMPERATURE) ** 1.5 * ((SUTHERLAND_REFERENCE_TEMPERATURE + SUTHERLAND_TEMPERATURE) / (t + SUTHERLAND_TEMPERATURE));
    for (const t of [250, 300, 350]) expect(Math.abs(sutherlandViscosity(t) / reference(t) - 1)).toBeLessThan(1e-4);
  });

  it('rejects NaN, infinity and zero', () => {
    expect(() => sutherlandViscosity(Number.NaN)).toThrow(AeroInputError);
    expect(() => sutherlandViscosity(Number.POSITIVE_INFINITY)).toThrow(/finite temperature/);
    expect(() => sutherlandViscosity(0)).toThrow(/`sutherlandViscosity` requires a positive temperature; got 0 K/);
  });
});

describe('kinematicViscosity', () => {
  it('gives ν0 = 1.4607e-5 m²/s at sea level', () => {
    // US Standard Atmosphere 1976 — from memory: ν0 = 1.4607e-5 m²/s = μ0/ρ0, ±1e-4 relative.
    expect(Math.abs(kinematicViscosity(ISA_SEA_LEVEL.viscosity, ISA_SEA_LEVEL.density) / 1.4607e-5 - 1)).toBeLessThan(1e-4);
  });

  it('rejects NaN, infinity and zero density', () => {
    expect(() => kinematicViscosity(Number.NaN, 1.2)).toThrow(/finite viscosity/);
    expect(() => kinematicViscosity(1.8e-5, Number.POSITIVE_INFINITY)).toThrow(/finite density/);
    expect(() => kinematicViscosity(1.8e-5, 0)).toThrow(/positive density; got 0 kg\/m³/);
  });
});

describe('speedOfSound', () => {
  it('gives a0 = 340.294 m/s at 288.15 K', () => {
    // US Standard Atmosphere 1976 — from memory: a0 = 340.294 m/s, ±1e-6 relative.
    expect(Math.abs(speedOfSound(288.15) / 340.294 - 1)).toBeLessThan(1e-6);
  });

  it('takes γ and R', () => {
    // Perfect-gas a = √(γRT) (definition): γ 1.67, R 2077 J/(kg·K) (helium, common practice), 300 K.
    expect(Math.abs(speedOfSound(300, 1.67, 2077) / Math.sqrt(1.67 * 2077 * 300) - 1)).toBeLessThan(1e-15);
  });

  it('rejects NaN, infinity and zero', () => {
    expect(() => speedOfSound(Number.NaN)).toThrow(AeroInputError);
    expect(() => speedOfSound(Number.POSITIVE_INFINITY)).toThrow(/finite temperature/);
    expect(() => speedOfSound(0)).toThrow(/positive temperature/);
    expect(() => speedOfSound(288.15, 0)).toThrow(/positive ratio of specific heats/);
  });
});

describe('ISA_SEA_LEVEL', () => {
  it('has ρ0 = p0/(R·T0) = 1.225000 kg/m³', () => {
    // US Standard Atmosphere 1976 — from memory: 101325/(287.05287 × 288.15) = 1.225000, ±1e-6 relative.
    const density = ISA_SEA_LEVEL.pressure / (ISA_GAS_CONSTANT * ISA_SEA_LEVEL.temperature);
    expect(Math.abs(density / 1.225 - 1)).toBeLessThan(1e-6);
    expect(ISA_SEA_LEVEL.density).toBe(1.225);
  });

  it('has μ0 = Sutherland(T0) = 1.7894e-5 Pa·s', () => {
    // US Standard Atmosphere 1976 — from memory: μ0 = 1.7894e-5 Pa·s, ±1e-4 relative.
    expect(Math.abs(sutherlandViscosity(ISA_SEA_LEVEL.temperature) / ISA_SEA_LEVEL.viscosity - 1)).toBeLessThan(1e-4);
  });
});
