import { AeroInputError } from '../errors/aero-input-error';
import type { MeasuredQuantity } from './measured-quantity';
import { relativeStandardUncertainty } from './relative-standard-uncertainty';

/** Inputs of {@link forceCoefficientRelativeUncertainty}. */
export interface ForceCoefficientUncertaintyInput {
  /** Measured force F, N, with its standard uncertainty. */
  readonly force: MeasuredQuantity;
  /** Dynamic pressure q, Pa, with its standard uncertainty. */
  readonly dynamicPressure: MeasuredQuantity;
  /** Reference area S, m², with its standard uncertainty. */
  readonly referenceArea: MeasuredQuantity;
}

/**
 * Relative combined standard uncertainty of a force coefficient C = F/(q·S), inputs uncorrelated.
 *
 * u_r(C)² = u_r(F)² + u_r(q)² + u_r(S)², with u_r(x) = u(x)/|x|.
 *
 * Source: GUM, JCGM 100:2008, 5.1.6 (products of powers; clause number from memory).
 *
 * @param input - force (N), dynamic pressure (Pa) and reference area (m²), each with its standard uncertainty
 * @returns relative combined standard uncertainty u_r(C) (dimensionless; 0.01 = 1 %)
 * @throws {AeroInputError} `ZERO_WIND` for q ≤ 0; `OUT_OF_RANGE` for a zero force, S ≤ 0 or a negative uncertainty;
 *   `NOT_FINITE` for NaN or ±Infinity
 * @example
 * forceCoefficientRelativeUncertainty({
 *   force: { value: 20, standardUncertainty: 0.06 },
 *   dynamicPressure: { value: 500, standardUncertainty: 2 },
 *   referenceArea: { value: 0.1, standardUncertainty: 0 },
 * }); // 0.005
 */
export function forceCoefficientRelativeUncertainty(input: ForceCoefficientUncertaintyInput): number {
  const fn = 'forceCoefficientRelativeUncertainty';
  const q = input.dynamicPressure.value;
  if (q <= 0) {
    throw new AeroInputError('ZERO_WIND', `\`${fn}\` requires a positive dynamic pressure; got ${q} Pa (is the wind on?)`);
  }
  if (input.referenceArea.value <= 0) {
    throw new AeroInputError('OUT_OF_RANGE', `\`${fn}\` requires a positive reference area; got ${input.referenceArea.value} m²`);
  }
  return Math.hypot(
    relativeStandardUncertainty(fn, 'force', input.force),
    relativeStandardUncertainty(fn, 'dynamic pressure', input.dynamicPressure),
    relativeStandardUncertainty(fn, 'reference area', input.referenceArea),
  );
}
