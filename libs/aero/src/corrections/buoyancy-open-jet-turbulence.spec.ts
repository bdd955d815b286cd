import { describe, expect, it } from 'vitest';
import { AeroInputError } from '../errors/aero-input-error';
import { effectiveReynoldsNumber } from './effective-reynolds-number';
import { horizontalBuoyancyDrag } from './horizontal-buoyancy-drag';
import { openJetDynamicPressureRatio } from './open-jet-dynamic-pressure-ratio';
import { SPHERE_CRITICAL_REYNOLDS_FREE_AIR, turbulenceFactor } from './turbulence-factor';

describe('horizontalBuoyancyDrag', () => {
  it('gives +0.100 N for dp/dx −5 Pa/m and V 0.02 m³', () => {
    // Glauert 1933, ARC R&M 1566; Barlow, Rae & Pope 1999, ch. 10: ΔD_B = −(dp/dx)V = 5 × 0.02 = 0.100 N (exact to 1e-15).
    expect(Math.abs(horizontalBuoyancyDrag({ pressureGradient: -5, modelVolume: 0.02 }) / 0.1 - 1)).toBeLessThan(1e-15);
  });

  it('is zero in a gradient-free section', () => {
    expect(Object.is(horizontalBuoyancyDrag({ pressureGradient: 0, modelVolume: 0.02 }), 0)).toBe(true);
  });

  it('rejects NaN, infinity and zero volume', () => {
    expect(() => horizontalBuoyancyDrag({ pressureGradient: Number.NaN, modelVolume: 0.02 })).toThrow(/finite pressure gradient; got NaN Pa\/m/);
    expect(() => horizontalBuoyancyDrag({ pressureGradient: -5, modelVolume: Number.POSITIVE_INFINITY })).toThrow(AeroInputError);
    expect(() => horizontalBuoyancyDrag({ pressureGradient: -5, modelVolume: 0 })).toThrow(/positive model volume; got 0 m³/);
  });
});

describe('openJetDynamicPressureRatio', () => {
  it('squares one plus the summed increments', () => {
    // Mercker & Wickern 1996, SAE 960671 — structure from memory: q_c/q_m = (1 + ε_s + ε_n + ε_c)²; (1 − 0.004)² = 0.992016.
    const ratio = openJetDynamicPressureRatio({ jetExpansion: -0.01, nozzleBlockage: 0.004, collectorBlockage: 0.002 });
    expect(Math.abs(ratio / 0.992016 - 1)).toBeLessThan(1e-12);
  });

  it('is one with no interference', () => {
    expect(openJetDynamicPressureRatio({ jetExpansion: 0, nozzleBlockage: 0, collectorBlockage: 0 })).toBe(1);
  });

  it('rejects NaN, infinity and a sum ≤ −1', () => {
    expect(() => openJetDynamicPressureRatio({ jetExpansion: Number.NaN, nozzleBlockage: 0, collectorBlockage: 0 })).toThrow(/finite jet expansion/);
    expect(() => openJetDynamicPressureRatio({ jetExpansion: 0, nozzleBlockage: Number.POSITIVE_INFINITY, collectorBlockage: 0 })).toThrow(AeroInputError);
    expect(() => openJetDynamicPressureRatio({ jetExpansion: -1, nozzleBlockage: 0, collectorBlockage: 0 })).toThrow(/above −1/);
  });
});

describe('turbulenceFactor', () => {
  it('gives TF 1.425926 for Re_crit 270 000', () => {
    // Barlow, Rae & Pope 1999, ch. 4, after Dryden — from memory: TF = 385 000/Re_crit = 1.425926, ±1e-6 relative.
    expect(Math.abs(turbulenceFactor(270_000) / 1.425926 - 1)).toBeLessThan(1e-6);
  });

  it('gives one in free air and scales the test Reynolds number', () => {
    // Barlow, Rae & Pope 1999, ch. 4 — from memory: Re_eff = TF·Re_test; published tunnel TF 1.22.
    expect(turbulenceFactor(SPHERE_CRITICAL_REYNOLDS_FREE_AIR)).toBe(1);
    expect(Math.abs(effectiveReynoldsNumber(1e6, 1.22) / 1.22e6 - 1)).toBeLessThan(1e-15);
  });

  it('rejects NaN, infinity and zero', () => {
    expect(() => turbulenceFactor(Number.NaN)).toThrow(AeroInputError);
    expect(() => turbulenceFactor(Number.POSITIVE_INFINITY)).toThrow(/finite critical Reynolds number/);
    expect(() => turbulenceFactor(0)).toThrow(/`turbulenceFactor` requires a positive critical Reynolds number; got 0/);
    expect(() => effectiveReynoldsNumber(1e6, 0)).toThrow(/positive turbulence factor/);
  });
});
