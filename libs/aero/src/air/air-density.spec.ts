import { describe, expect, it } from 'vitest';
import { airDensity, type AirDensityModel } from './air-density';

const ROOM = { pressure: 101325, temperature: 293.15, relativeHumidity: 0.5 };

describe('airDensity', () => {
  it('uses CIPM-2007 for "cipm-2007"', () => {
    // CIPM-2007, Picard et al. 2008, Metrologia 45:149: 1.199314 kg/m³ at 20 °C, 101325 Pa, 50 %.
    expect(Math.abs(airDensity('cipm-2007', ROOM) - 1.199314)).toBeLessThan(2e-6);
  });

  it('uses the ideal-gas form with Buck e_s for "ideal-gas-buck"', () => {
    // Ideal-gas mixture with Buck 1981 e_s = 2338.34 Pa: (101325 − 1169.17)/(287.05·293.15) + 1169.17/(461.52·293.15).
    const e = 0.5 * 2338.34;
    const expected = (101325 - e) / (287.05 * 293.15) + e / (461.52 * 293.15);
    expect(Math.abs(airDensity('ideal-gas-buck', ROOM) / expected - 1)).toBeLessThan(1e-7);
  });

  it('rejects an unknown model by name', () => {
    expect(() => airDensity('perfect' as AirDensityModel, ROOM)).toThrow(/`airDensity` requires a model of cipm-2007 or ideal-gas-buck; got perfect/);
  });

  it('passes on NaN, infinity and zero errors of the model', () => {
    expect(() => airDensity('cipm-2007', { ...ROOM, pressure: Number.NaN })).toThrow(/finite pressure/);
    expect(() => airDensity('ideal-gas-buck', { ...ROOM, pressure: Number.POSITIVE_INFINITY })).toThrow(/finite pressure/);
    expect(() => airDensity('ideal-gas-buck', { ...ROOM, pressure: 0 })).toThrow(/positive pressure/);
  });
});
