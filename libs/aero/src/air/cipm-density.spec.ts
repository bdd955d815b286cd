import { describe, expect, it } from 'vitest';
import { AeroInputError } from '../errors/aero-input-error';
import { cipmCompressibility } from './cipm-compressibility';
import { cipmDensity } from './cipm-density';
import { cipmEnhancementFactor } from './cipm-enhancement-factor';
import { cipmSaturationVapourPressure } from './cipm-saturation-vapour-pressure';
import { cipmVapourMoleFraction } from './cipm-vapour-mole-fraction';

const ROOM = { pressure: 101325, temperature: 293.15, relativeHumidity: 0.5 };

describe('cipmDensity (CIPM-2007)', () => {
  it('gives 1.199314 kg/m³ at 20 °C, 101325 Pa, 50 % RH, 400 ppm CO2', () => {
    // CIPM-2007, Picard et al. 2008, Metrologia 45:149: 1.199314 kg/m³, compared to ±2e-6 kg/m³ absolute.
    expect(Math.abs(cipmDensity({ ...ROOM, co2MoleFraction: 0.0004 }) - 1.199314)).toBeLessThan(2e-6);
  });

  it('gives 1.204557 kg/m³ for dry air at 20 °C, 101325 Pa', () => {
    // CIPM-2007, Picard et al. 2008, Metrologia 45:149: 1.204557 kg/m³, ±2e-6 kg/m³ absolute.
    expect(Math.abs(cipmDensity({ ...ROOM, relativeHumidity: 0 }) - 1.204557)).toBeLessThan(2e-6);
  });

  it('lowers the density by 0.435 % at 50 % RH, 20 °C', () => {
    // CIPM-2007, Picard et al. 2008: 1 − 1.199314/1.204557 = 0.435 %; compare to ±0.001 percentage point.
    const drop = 1 - cipmDensity(ROOM) / cipmDensity({ ...ROOM, relativeHumidity: 0 });
    expect(Math.abs(drop - 0.00435)).toBeLessThan(1e-5);
  });

  it('defaults CO2 to 400 µmol/mol and raises ρ with more CO2', () => {
    // CIPM-2007, Picard et al. 2008: M_a = [28.96546 + 12.011(x_CO2 − 0.0004)] g/mol, so ρ ∝ M_a for dry air.
    const dry = { ...ROOM, relativeHumidity: 0 };
    expect(cipmDensity(dry)).toBe(cipmDensity({ ...dry, co2MoleFraction: 0.0004 }));
    const ratio = cipmDensity({ ...dry, co2MoleFraction: 0.0005 }) / cipmDensity(dry);
    expect(Math.abs(ratio - (28.96546 + 12.011 * 0.0001) / 28.96546)).toBeLessThan(1e-12);
  });

  it('rejects NaN, infinity and zero pressure', () => {
    expect(() => cipmDensity({ ...ROOM, pressure: Number.NaN })).toThrow(AeroInputError);
    expect(() => cipmDensity({ ...ROOM, temperature: Number.POSITIVE_INFINITY })).toThrow(/finite temperature/);
    expect(() => cipmDensity({ ...ROOM, pressure: 0 })).toThrow(/positive pressure; got 0 Pa/);
  });

  it('rejects relative humidity given in percent', () => {
    expect(() => cipmDensity({ ...ROOM, relativeHumidity: 50 })).toThrow(expect.objectContaining({ code: 'OUT_OF_RANGE' }));
  });

  it('rejects a vapour pressure above the total pressure', () => {
    // At 100 °C, p_sv ≈ 101.4 kPa (steam tables, common practice), above a 50 kPa total pressure.
    expect(() => cipmDensity({ pressure: 50_000, temperature: 373.15, relativeHumidity: 1 })).toThrow(/below the total pressure/);
  });
});

describe('CIPM-2007 parts at 20 °C, 101325 Pa', () => {
  it('p_sv = 2339.16 Pa', () => {
    // CIPM-2007, Picard et al. 2008: p_sv(293.15 K) = 2339.16 Pa. The value is printed to 0.01 Pa, so compare to
    // half its last digit (±0.005 Pa, 2e-6 relative); 1e-6 relative would be tighter than the printed figure.
    expect(Math.abs(cipmSaturationVapourPressure(293.15) - 2339.16)).toBeLessThan(0.005);
  });

  it('f = 1.004026', () => {
    // CIPM-2007, Picard et al. 2008: f = 1.00062 + 3.14e-8·101325 + 5.6e-7·400 = 1.004026, ±1e-6 relative.
    expect(Math.abs(cipmEnhancementFactor(101325, 20) / 1.004026 - 1)).toBeLessThan(1e-6);
  });

  it('Z = 0.9996148 at 50 % RH', () => {
    // CIPM-2007, Picard et al. 2008: Z = 0.9996148, ±1e-6 relative.
    const x = cipmVapourMoleFraction(ROOM);
    expect(Math.abs(cipmCompressibility(101325, 293.15, x) / 0.9996148 - 1)).toBeLessThan(1e-6);
  });

  it('x_v = h·f·p_sv/p', () => {
    // CIPM-2007, Picard et al. 2008 eq. A1.1: 0.5 × 1.004026 × 2339.16 / 101325 = 0.0115893.
    expect(Math.abs(cipmVapourMoleFraction(ROOM) / 0.0115893 - 1)).toBeLessThan(1e-5);
  });

  it('x_v is zero for dry air and Z is then below one', () => {
    // CIPM-2007, Picard et al. 2008 eq. A1.4: with x_v = 0, Z = 1 − (p/T)(a0 + a1t + a2t²) + (p/T)²d.
    const pt = 101325 / 293.15;
    const expected = 1 - pt * (1.58123e-6 - 2.9331e-8 * 20 + 1.1043e-10 * 400) + pt * pt * 1.83e-11;
    expect(cipmVapourMoleFraction({ ...ROOM, relativeHumidity: 0 })).toBe(0);
    expect(Math.abs(cipmCompressibility(101325, 293.15, 0) / expected - 1)).toBeLessThan(1e-12);
  });

  it('rejects NaN, infinity and zero in each part', () => {
    expect(() => cipmSaturationVapourPressure(0)).toThrow(/positive temperature; got 0 K/);
    expect(() => cipmSaturationVapourPressure(Number.NaN)).toThrow(AeroInputError);
    expect(() => cipmEnhancementFactor(Number.POSITIVE_INFINITY, 20)).toThrow(/finite pressure/);
    expect(() => cipmEnhancementFactor(101325, -300)).toThrow(/above absolute zero/);
    expect(() => cipmCompressibility(101325, 293.15, 2)).toThrow(/vapour mole fraction between 0 and 1/);
  });
});
