import { describe, expect, it } from 'vitest';
import { convertToSi, parseUnit, SI_UNIT_OF_KIND, type QuantityKind } from './unit-table';

/** Converts one unit of `symbol` to SI. */
function factor(symbol: string, kind: QuantityKind): number {
  const unit = parseUnit(symbol, kind);
  if (!unit) throw new Error(`no unit ${symbol} for ${kind}`);
  return convertToSi(1, unit) - convertToSi(0, unit);
}

// NIST SP 811 (2008) App. B.8 prints its factors to 7 significant digits, so compare to 5e-7 relative.
const SP811_TOLERANCE = 5e-7;

describe('unit factors against NIST SP 811 (2008) App. B.8', () => {
  it.each([
    // [symbol, kind, SP 811 factor to SI, SP 811 entry]
    ['lbf', 'force', 4.448222, 'pound-force (lbf) to newton'],
    ['lbf ft', 'moment', 1.355818, 'pound-force foot (lbf·ft) to newton meter'],
    ['lbf in', 'moment', 1.129848e-1, 'pound-force inch (lbf·in) to newton meter'],
    ['psf', 'pressure', 4.788026e1, 'pound-force per square foot to pascal'],
    ['psi', 'pressure', 6.894757e3, 'pound-force per square inch to pascal'],
    ['inH2O', 'pressure', 2.49082e2, 'inch of water (39.2 °F) to pascal'],
    ['mbar', 'pressure', 1e2, 'millibar to pascal (exact)'],
    ['bar', 'pressure', 1e5, 'bar to pascal (exact)'],
    ['mph', 'speed', 4.4704e-1, 'mile per hour to meter per second (exact)'],
    ['km/h', 'speed', 2.777778e-1, 'kilometer per hour to meter per second'],
    ['kn', 'speed', 5.144444e-1, 'knot (nautical mile per hour) to meter per second'],
    ['ft/s', 'speed', 3.048e-1, 'foot per second to meter per second (exact)'],
    ['deg', 'angle', 1.745329e-2, 'degree (°) to radian'],
  ] as const)('%s (%s) = %d SI: %s', (symbol, kind, expected, _entry) => {
    expect(Math.abs(factor(symbol, kind) / expected - 1)).toBeLessThan(SP811_TOLERANCE);
  });

  it('keeps the exact definitions exact', () => {
    // NIST SP 811 App. B.8: 1 mph = 0.44704 m/s and 1 mbar = 100 Pa exactly; the pound-force is the
    // avoirdupois pound 0.45359237 kg (SP 811 App. B.8, exact) times g_n = 9.80665 m/s² (exact).
    expect(factor('mph', 'speed')).toBe(0.44704);
    expect(factor('mbar', 'pressure')).toBe(100);
    expect(factor('lbf', 'force')).toBe(0.45359237 * 9.80665);
  });

  // SI prefixes k = 1e3, h = 1e2, m = 1e-3: NIST SP 811 sec. 4.3, Table 5 (section number from memory).
  it('uses SI prefixes for kPa, hPa and ms', () => {
    expect(factor('kPa', 'pressure')).toBe(1000);
    expect(factor('hPa', 'pressure')).toBe(100);
    expect(factor('ms', 'time')).toBe(0.001);
  });
});

describe('temperatures (NIST SP 811 (2008) App. B.9)', () => {
  const degC = parseUnit('degC', 'temperature')!;
  const degF = parseUnit('degF', 'temperature')!;

  it('converts degree Celsius: T/K = t/°C + 273.15', () => {
    expect(convertToSi(0, degC)).toBe(273.15);
    expect(convertToSi(20, degC)).toBeCloseTo(293.15, 12);
  });

  it('converts degree Fahrenheit: T/K = (t/°F + 459.67) / 1.8', () => {
    // 32 °F is the ice point 273.15 K and 212 °F the steam point 373.15 K (SP 811 App. B.9 definitions).
    expect(convertToSi(32, degF)).toBeCloseTo(273.15, 10);
    expect(convertToSi(212, degF)).toBeCloseTo(373.15, 10);
    // -40 °F and -40 °C are the same temperature, 233.15 K (follows from both B.9 formulas).
    expect(convertToSi(-40, degF)).toBeCloseTo(convertToSi(-40, degC), 10);
  });

  it('leaves kelvin unchanged', () => {
    expect(convertToSi(300, parseUnit('K', 'temperature')!)).toBe(300);
  });
});

describe('parseUnit', () => {
  it('accepts the moment spellings N m, N·m and Nm', () => {
    for (const text of ['N m', 'N·m', 'Nm', 'n  M']) expect(parseUnit(text, 'moment')?.symbol).toBe('N m');
  });

  it('accepts lbf ft spellings', () => {
    for (const text of ['lbf ft', 'lbf·ft', 'ft lbf']) expect(parseUnit(text, 'moment')?.symbol).toBe('lbf ft');
  });

  it('tells the knot from the kilonewton by quantity kind', () => {
    expect(parseUnit('kn', 'speed')?.symbol).toBe('kn');
    expect(parseUnit('kN', 'force')?.symbol).toBe('kN');
    expect(parseUnit('kn', 'force')?.symbol).toBe('kN');
  });

  it('reads relative humidity in percent or as a fraction', () => {
    expect(convertToSi(45, parseUnit('%', 'fraction')!)).toBeCloseTo(0.45, 15);
    expect(convertToSi(0.45, parseUnit('fraction', 'fraction')!)).toBe(0.45);
  });

  it('returns undefined for unknown units and for units of another kind', () => {
    expect(parseUnit('Torr', 'pressure')).toBeUndefined();
    expect(parseUnit('Pa', 'force')).toBeUndefined();
    expect(parseUnit('', 'pressure')).toBeUndefined();
  });

  it('names the SI target of every kind', () => {
    expect(SI_UNIT_OF_KIND.pressure).toBe('Pa');
    expect(SI_UNIT_OF_KIND.temperature).toBe('K');
    expect(SI_UNIT_OF_KIND.moment).toBe('N m');
  });
});

describe('convertToSi on special values', () => {
  const hPa = parseUnit('hPa', 'pressure')!;
  it('passes NaN through', () => expect(convertToSi(NaN, hPa)).toBeNaN());
  it('keeps infinities', () => expect(convertToSi(-Infinity, hPa)).toBe(-Infinity));
  it('maps zero to zero for a unit without offset', () => expect(convertToSi(0, hPa)).toBe(0));
});
