import { AeroInputError } from './aero-input-error';

/**
 * Checks that an input is a finite number.
 *
 * @param fn - name of the calling function, for the message
 * @param what - what the value is, e.g. "temperature"
 * @param value - the value to check
 * @param unit - its unit for the message, e.g. "K"
 * @throws {AeroInputError} `NOT_FINITE` if value is NaN, ±Infinity or not a number
 * @example
 * requireFinite('machNumber', 'speed', 30, 'm/s'); // 30
 */
export function requireFinite(fn: string, what: string, value: number, unit: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new AeroInputError('NOT_FINITE', `\`${fn}\` requires a finite ${what}; got ${String(value)}${unit ? ` ${unit}` : ''}`);
  }
  return value;
}

/**
 * Checks that an input is a finite number greater than zero.
 *
 * @param fn - name of the calling function, for the message
 * @param what - what the value is, e.g. "density"
 * @param value - the value to check
 * @param unit - its unit for the message, e.g. "kg/m³"
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for zero or negative values
 * @example
 * requirePositive('dynamicPressure', 'density', 1.2, 'kg/m³'); // 1.2
 */
export function requirePositive(fn: string, what: string, value: number, unit: string): number {
  requireFinite(fn, what, value, unit);
  if (value <= 0) {
    throw new AeroInputError('OUT_OF_RANGE', `\`${fn}\` requires a positive ${what}; got ${value}${unit ? ` ${unit}` : ''}`);
  }
  return value;
}

/**
 * Checks that an input is a finite number of zero or more.
 *
 * @param fn - name of the calling function, for the message
 * @param what - what the value is
 * @param value - the value to check
 * @param unit - its unit for the message
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for negative values
 * @example
 * requireNonNegative('expandedUncertainty', 'standard uncertainty', 0, ''); // 0
 */
export function requireNonNegative(fn: string, what: string, value: number, unit: string): number {
  requireFinite(fn, what, value, unit);
  if (value < 0) {
    throw new AeroInputError('OUT_OF_RANGE', `\`${fn}\` requires a non-negative ${what}; got ${value}${unit ? ` ${unit}` : ''}`);
  }
  return value;
}

/**
 * Checks that an input is a finite fraction in [0, 1].
 *
 * @param fn - name of the calling function
 * @param what - what the value is, e.g. "relative humidity"
 * @param value - the value to check, a fraction (0.5 = 50 %)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` outside 0–1
 * @example
 * requireFraction('cipmDensity', 'relative humidity', 0.5); // 0.5
 */
export function requireFraction(fn: string, what: string, value: number): number {
  requireFinite(fn, what, value, '');
  if (value < 0 || value > 1) {
    throw new AeroInputError('OUT_OF_RANGE', `\`${fn}\` requires a ${what} between 0 and 1 (a fraction, 0.5 = 50 %); got ${value}`);
  }
  return value;
}
