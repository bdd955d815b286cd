import { AeroInputError } from '../errors/aero-input-error';
import { requireFinite } from '../errors/require-number';

/** Summary of repeated readings of one quantity. */
export interface MeanWithStandardUncertainty {
  /** Number of readings. */
  readonly n: number;
  /** Arithmetic mean x̄, unit of the readings. */
  readonly mean: number;
  /** Experimental standard deviation s (n − 1 in the denominator), unit of the readings. */
  readonly standardDeviation: number;
  /** Type A standard uncertainty of the mean u = s/√n, unit of the readings. */
  readonly standardUncertainty: number;
}

/**
 * Mean of repeated readings with its Type A standard uncertainty.
 *
 * x̄ = Σx_i/n; s² = Σ(x_i − x̄)²/(n − 1); u(x̄) = s/√n.
 *
 * Source: GUM, JCGM 100:2008, 4.2.1–4.2.3 (eq. 3–5; clause and equation numbers from memory).
 *
 * @param values - the readings, any one unit, at least two
 * @returns n, mean, standard deviation s and standard uncertainty s/√n
 * @throws {AeroInputError} `EMPTY_INPUT` for fewer than two readings, `NOT_FINITE` for a NaN or infinite reading (naming its index)
 * @example
 * meanWithStandardUncertainty([1, 2, 3]); // { n: 3, mean: 2, standardDeviation: 1, standardUncertainty: 0.57735 }
 */
export function meanWithStandardUncertainty(values: readonly number[]): MeanWithStandardUncertainty {
  const fn = 'meanWithStandardUncertainty';
  if (values.length < 2) {
    throw new AeroInputError('EMPTY_INPUT', `\`${fn}\` requires at least two readings to estimate a standard deviation; got ${values.length}`);
  }
  let sum = 0;
  values.forEach((value, index) => {
    requireFinite(fn, `reading at index ${index}`, value, '');
    sum += value;
  });
  const n = values.length;
  const mean = sum / n;
  // Two passes: squared deviations from the mean, not Σx² − n·x̄², which cancels badly for readings like 50.12.
  let squares = 0;
  for (const value of values) squares += (value - mean) ** 2;
  const standardDeviation = Math.sqrt(squares / (n - 1));
  return { n, mean, standardDeviation, standardUncertainty: standardDeviation / Math.sqrt(n) };
}
