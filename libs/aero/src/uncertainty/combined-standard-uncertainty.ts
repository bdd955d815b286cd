import { AeroInputError } from '../errors/aero-input-error';
import { requireFinite, requireNonNegative } from '../errors/require-number';

/** One input of a measurement model: its sensitivity coefficient and standard uncertainty. */
export interface UncertaintyTerm {
  /** Sensitivity coefficient c_i = ∂f/∂x_i, unit of the result per unit of x_i. */
  readonly sensitivity: number;
  /** Standard uncertainty u(x_i), unit of x_i, ≥ 0. */
  readonly standardUncertainty: number;
}

/**
 * Combined standard uncertainty of uncorrelated inputs (law of propagation of uncertainty).
 *
 * u_c = √(Σ c_i² · u(x_i)²). Correlated inputs need the covariance terms, which this function does not add.
 *
 * Source: GUM, JCGM 100:2008, 5.1.2, eq. 10 (clause and equation numbers from memory).
 *
 * @param terms - sensitivity c_i and standard uncertainty u(x_i) of each input, at least one
 * @returns combined standard uncertainty u_c, unit of the result
 * @throws {AeroInputError} `EMPTY_INPUT` for no terms; `NOT_FINITE` or `OUT_OF_RANGE` for a bad term, naming its index
 * @example
 * combinedStandardUncertainty([{ sensitivity: 1, standardUncertainty: 3 }, { sensitivity: 2, standardUncertainty: 2 }]); // 5
 */
export function combinedStandardUncertainty(terms: readonly UncertaintyTerm[]): number {
  const fn = 'combinedStandardUncertainty';
  if (terms.length === 0) {
    throw new AeroInputError('EMPTY_INPUT', `\`${fn}\` requires at least one uncertainty term; got none`);
  }
  const contributions = terms.map((term, index) => {
    const c = requireFinite(fn, `sensitivity of term ${index}`, term.sensitivity, '');
    const u = requireNonNegative(fn, `standard uncertainty of term ${index}`, term.standardUncertainty, '');
    return c * u;
  });
  // Math.hypot scales internally, so very large or small contributions do not overflow or underflow.
  return Math.hypot(...contributions);
}
