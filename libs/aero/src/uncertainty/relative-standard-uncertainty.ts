import { AeroInputError } from '../errors/aero-input-error';
import { requireFinite, requireNonNegative } from '../errors/require-number';
import type { MeasuredQuantity } from './measured-quantity';

/**
 * Relative standard uncertainty: u_r(x) = u(x)/|x|.
 * Source: GUM, JCGM 100:2008, 5.1.6 (clause number from memory).
 *
 * @param fn - calling function, for the message
 * @param what - which quantity, e.g. "force"
 * @param quantity - value (any unit, not zero) and its standard uncertainty (same unit, ≥ 0)
 * @returns u_r (dimensionless)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity; `OUT_OF_RANGE` for a zero value or negative u
 * @example
 * relativeStandardUncertainty('forceCoefficientRelativeUncertainty', 'force', { value: 20, standardUncertainty: 0.1 }); // 0.005
 */
export function relativeStandardUncertainty(fn: string, what: string, quantity: MeasuredQuantity): number {
  requireFinite(fn, what, quantity.value, '');
  requireNonNegative(fn, `standard uncertainty of the ${what}`, quantity.standardUncertainty, '');
  if (quantity.value === 0) {
    throw new AeroInputError('OUT_OF_RANGE', `\`${fn}\` requires a non-zero ${what} for a relative uncertainty; got 0`);
  }
  return quantity.standardUncertainty / Math.abs(quantity.value);
}
