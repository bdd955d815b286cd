import { AeroInputError } from '../errors/aero-input-error';
import { requireFinite } from '../errors/require-number';

/**
 * Relative difference of a value from a reference: (value − reference)/|reference|.
 * Source: definition (GUM JCGM 100:2008 uses relative quantities of this form, e.g. u(x)/|x|).
 *
 * @param value - the value being compared, any unit
 * @param reference - the reference value, same unit, not zero
 * @returns signed relative difference (dimensionless; 0.01 = 1 % above the reference)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for a zero reference
 * @example
 * relativeDifference(1.01, 1); // ≈ 0.01
 */
export function relativeDifference(value: number, reference: number): number {
  requireFinite('relativeDifference', 'value', value, '');
  requireFinite('relativeDifference', 'reference', reference, '');
  if (reference === 0) {
    throw new AeroInputError('OUT_OF_RANGE', '`relativeDifference` requires a non-zero reference; got 0');
  }
  return (value - reference) / Math.abs(reference);
}
