import {
  CELSIUS_ZERO,
  FOOT,
  INCH,
  INCH_OF_WATER,
  KILOMETRE_PER_HOUR,
  KNOT,
  MILE_PER_HOUR,
  POUND_FORCE,
  POUND_FORCE_FOOT,
  POUND_FORCE_PER_SQUARE_FOOT,
} from './nist-constants';

/** Kinds of quantity a run-file channel can carry. */
export type QuantityKind =
  | 'pressure'
  | 'temperature'
  | 'force'
  | 'moment'
  | 'angle'
  | 'speed'
  | 'fraction'
  | 'time'
  | 'count'
  | 'bridge';

/**
 * One accepted unit: the value in the target unit is `(value + offset) × scale`.
 * The target is SI except for `bridge` (mV/V) and the dimensionless kinds (`1`).
 */
export interface UnitDefinition {
  /** Canonical symbol, e.g. `kPa`. */
  symbol: string;
  kind: QuantityKind;
  /** Multiplier to the target unit after adding `offset`. */
  scale: number;
  /** Added before scaling (only temperatures have one). */
  offset: number;
}

/** Target unit of each quantity kind. */
export const SI_UNIT_OF_KIND: Readonly<Record<QuantityKind, string>> = {
  pressure: 'Pa',
  temperature: 'K',
  force: 'N',
  moment: 'N m',
  angle: 'rad',
  speed: 'm/s',
  fraction: '1',
  time: 's',
  count: '1',
  bridge: 'mV/V',
};

interface UnitRow {
  symbol: string;
  aliases: readonly string[];
  kind: QuantityKind;
  scale: number;
  offset?: number;
}

// Factors are the exact NIST SP 811 (2008) App. B definitions from nist-constants.ts.
const UNIT_ROWS: readonly UnitRow[] = [
  { symbol: 'Pa', aliases: ['N/m2', 'N/m^2'], kind: 'pressure', scale: 1 },
  { symbol: 'kPa', aliases: [], kind: 'pressure', scale: 1000 },
  { symbol: 'hPa', aliases: [], kind: 'pressure', scale: 100 },
  { symbol: 'mbar', aliases: [], kind: 'pressure', scale: 100 },
  { symbol: 'bar', aliases: [], kind: 'pressure', scale: 100_000 },
  { symbol: 'psf', aliases: ['lbf/ft2', 'lbf/ft^2'], kind: 'pressure', scale: POUND_FORCE_PER_SQUARE_FOOT },
  { symbol: 'psi', aliases: ['lbf/in2', 'lbf/in^2'], kind: 'pressure', scale: POUND_FORCE / (INCH * INCH) },
  { symbol: 'inH2O', aliases: ['in H2O', 'inWC', 'in wc'], kind: 'pressure', scale: INCH_OF_WATER },
  { symbol: 'K', aliases: [], kind: 'temperature', scale: 1 },
  { symbol: 'degC', aliases: ['°C', 'C', 'deg C'], kind: 'temperature', scale: 1, offset: CELSIUS_ZERO },
  // NIST SP 811 App. B.9: T/K = (t/°F + 459.67) / 1.8
  { symbol: 'degF', aliases: ['°F', 'F', 'deg F'], kind: 'temperature', scale: 1 / 1.8, offset: 459.67 },
  { symbol: 'N', aliases: [], kind: 'force', scale: 1 },
  { symbol: 'kN', aliases: [], kind: 'force', scale: 1000 },
  { symbol: 'lbf', aliases: [], kind: 'force', scale: POUND_FORCE },
  { symbol: 'N m', aliases: ['N·m', 'Nm', 'N*m', 'N.m', 'N-m'], kind: 'moment', scale: 1 },
  { symbol: 'lbf ft', aliases: ['lbf·ft', 'lbfft', 'lbf*ft', 'ft lbf', 'ft·lbf', 'ft-lbf', 'lbf-ft'], kind: 'moment', scale: POUND_FORCE_FOOT },
  { symbol: 'lbf in', aliases: ['lbf·in', 'in lbf', 'in·lbf', 'in-lbf', 'lbf-in'], kind: 'moment', scale: POUND_FORCE * INCH },
  { symbol: 'deg', aliases: ['°', 'degree', 'degrees'], kind: 'angle', scale: Math.PI / 180 },
  { symbol: 'rad', aliases: ['radian', 'radians'], kind: 'angle', scale: 1 },
  { symbol: 'm/s', aliases: ['m s-1'], kind: 'speed', scale: 1 },
  { symbol: 'km/h', aliases: ['kph', 'kmh'], kind: 'speed', scale: KILOMETRE_PER_HOUR },
  { symbol: 'mph', aliases: ['mi/h'], kind: 'speed', scale: MILE_PER_HOUR },
  { symbol: 'kn', aliases: ['kt', 'knot', 'knots'], kind: 'speed', scale: KNOT },
  { symbol: 'ft/s', aliases: ['fps'], kind: 'speed', scale: FOOT },
  { symbol: '%', aliases: ['percent'], kind: 'fraction', scale: 0.01 },
  { symbol: '1', aliases: ['fraction'], kind: 'fraction', scale: 1 },
  { symbol: 's', aliases: ['sec'], kind: 'time', scale: 1 },
  { symbol: 'ms', aliases: [], kind: 'time', scale: 0.001 },
  { symbol: '1', aliases: ['-', ''], kind: 'count', scale: 1 },
  { symbol: 'mV/V', aliases: [], kind: 'bridge', scale: 1 },
  { symbol: 'µV/V', aliases: ['uV/V', 'μV/V'], kind: 'bridge', scale: 0.001 },
];

/** Lower-cases and collapses runs of white space, so `N  M` and `n m` look the same. */
function unitKey(kind: QuantityKind, text: string): string {
  return `${kind}|${text.trim().replace(/\s+/g, ' ').toLowerCase()}`;
}

const UNIT_INDEX = new Map<string, UnitDefinition>();
for (const row of UNIT_ROWS) {
  const definition: UnitDefinition = { symbol: row.symbol, kind: row.kind, scale: row.scale, offset: row.offset ?? 0 };
  for (const text of [row.symbol, ...row.aliases]) UNIT_INDEX.set(unitKey(row.kind, text), Object.freeze(definition));
}

/**
 * Looks up a unit symbol for one quantity kind. Matching ignores case and repeated spaces; within one
 * kind no two symbols differ only by case (so `kn` the knot and `kN` the kilonewton never meet).
 * @param text unit as written, e.g. `hPa`, `N·m`, `degC`
 * @param kind quantity the unit must measure
 * @returns the definition, or undefined when the unit is not accepted for that kind
 * @example parseUnit('hPa', 'pressure') // { symbol: 'hPa', kind: 'pressure', scale: 100, offset: 0 }
 */
export function parseUnit(text: string, kind: QuantityKind): UnitDefinition | undefined {
  return UNIT_INDEX.get(unitKey(kind, text));
}

/**
 * Accepted unit symbols of one kind (canonical symbols only), for messages and documentation.
 * @param kind quantity kind
 */
export function unitSymbolsOfKind(kind: QuantityKind): string[] {
  return [...new Set(UNIT_ROWS.filter((row) => row.kind === kind).map((row) => row.symbol))];
}

/**
 * Converts a value to the target unit of its kind: `(value + offset) × scale`.
 * @param value value in `unit`
 * @param unit a definition from `parseUnit`
 * @returns value in `SI_UNIT_OF_KIND[unit.kind]`
 * @example convertToSi(20, parseUnit('degC', 'temperature')!) // 293.15 (K)
 */
export function convertToSi(value: number, unit: UnitDefinition): number {
  return (value + unit.offset) * unit.scale;
}
