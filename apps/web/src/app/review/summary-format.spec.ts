import { airText, coefficientText, dragText, powerText, reynoldsText, windDirectionText } from './summary-format';

describe('summary formatting', () => {
  it('shows power and drag to three significant figures, in kilo units from 1000 up', () => {
    expect(powerText(253.5)).toBe('254 W');
    expect(powerText(4830.4)).toBe('4.83 kW');
    expect(powerText(12_345)).toBe('12.3 kW');
    expect(powerText(null)).toBe('—');
    expect(dragText(25.35)).toBe('25.4 N');
    expect(dragText(1999.9)).toBe('2 kN');
  });

  it('writes Reynolds numbers as mantissa × 10 to a power, carrying a rounded 10.00 up', () => {
    expect(reynoldsText(2.053761e6)).toBe('2.05 × 10⁶');
    expect(reynoldsText(385_000)).toBe('3.85 × 10⁵');
    expect(reynoldsText(9.999e5)).toBe('1.00 × 10⁶');
    expect(reynoldsText(0)).toBe('—');
    expect(reynoldsText(null)).toBe('—');
  });

  it('writes a coefficient with its expanded uncertainty to four decimals', () => {
    expect(coefficientText({ value: 0.31234, expandedUncertainty: 0.00412 })).toBe('0.3123 ± 0.0041');
    expect(coefficientText({ value: -0.05, expandedUncertainty: null })).toBe('-0.0500');
    expect(coefficientText(null)).toBe('—');
  });

  it('names the full-scale air: ISA sea level, or the entered dry air', () => {
    // ISA sea level: 1.225 kg/m³, 288.15 K, 101 325 Pa (US Standard Atmosphere 1976, from memory).
    expect(airText({ density: 1.225, temperature: 288.15, pressure: 101325, standard: true })).toBe('ISA sea-level air (1.225 kg/m³, 15 °C, 1,013.25 hPa)');
    expect(airText({ density: 1.11167, temperature: 281.65, pressure: 89876, standard: false })).toBe('dry air at 8.5 °C and 898.76 hPa (1.112 kg/m³)');
  });

  it('names the wind by its direction from the heading', () => {
    expect(windDirectionText(0)).toBe('Head wind');
    expect(windDirectionText(360)).toBe('Head wind');
    expect(windDirectionText(180)).toBe('Tail wind');
    expect(windDirectionText(90)).toBe('Cross wind (90°)');
    expect(windDirectionText(270)).toBe('Cross wind (270°)');
    expect(windDirectionText(47)).toBe('Quartering head wind (47°)');
    expect(windDirectionText(225)).toBe('Quartering tail wind (225°)');
  });
});
