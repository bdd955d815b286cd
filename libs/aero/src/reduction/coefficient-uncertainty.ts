import { combinedStandardUncertainty, expandedUncertainty, precisionLimit, u95 } from '../uncertainty';
import type { CoefficientUncertainty } from './reduction-result';

/** Inputs of `coefficientUncertainty`; every uncertainty is a standard uncertainty (k = 1). */
export interface CoefficientUncertaintyInput {
  /** Corrected coefficient C = F/(q_c·S) or M/(q_c·S·L), dimensionless. */
  coefficient: number;
  /** Corrected dynamic pressure q_c, Pa. */
  correctedDynamicPressure: number;
  /** Measured (uncorrected) dynamic pressure q_u, Pa, and its standard uncertainty, Pa. */
  dynamicPressure: number;
  dynamicPressureUncertainty: number;
  /** Standard uncertainty of the load F (N) or moment M (N·m). */
  loadUncertainty: number;
  /** Reference area S, m², and its standard uncertainty. */
  referenceArea: number;
  referenceAreaUncertainty: number;
  /** Reference length L, m, and its standard uncertainty, for moment coefficients; omit for forces. */
  referenceLength?: number;
  referenceLengthUncertainty?: number;
  /** Sample standard deviation s of the per-sample coefficient over the point, and the sample count N. */
  sampleStandardDeviation: number;
  sampleCount: number;
}

/**
 * GUM uncertainty of a force or moment coefficient, systematic and random parts kept apart.
 *
 * For C = F/(q_c·S·L): sensitivities ∂C/∂F = 1/(q_c·S·L), ∂C/∂q = −C/q, ∂C/∂S = −C/S, ∂C/∂L = −C/L;
 * u_B² = Σ(c_i·u_i)² (uncorrelated inputs); u_A = s/√N; u_c = √(u_B² + u_A²); U = 2·u_c.
 * B = 2·u_B, P = 2·s/√N and U95 = √(B² + P²), which equals U for large samples.
 * Sources: JCGM 100:2008 (GUM) §4.2.3 and §5.1.2 eq. 10, ch. 6 (k = 2); AIAA S-071A-1999 and Coleman &
 * Steele, AIAA J 33(10), 1995 (bias and precision limits) — clause numbers from memory.
 *
 * @param input - coefficient, pressures (Pa), load uncertainty (N or N·m), S (m²), L (m), s and N
 * @returns sensitivities, u_B, u_A, u_c, U (k = 2), B, P and U95 (all dimensionless except sensitivities)
 * @throws {RangeError} "`coefficientUncertainty` requires …" for a non-positive q, S, L or N
 * @example
 * coefficientUncertainty({ coefficient: 0.3, correctedDynamicPressure: 600, dynamicPressure: 600,
 *   dynamicPressureUncertainty: 3, loadUncertainty: 0, referenceArea: 1, referenceAreaUncertainty: 0,
 *   sampleStandardDeviation: 0, sampleCount: 100 }).expandedUncertainty; // 2·0.3·3/600 = 0.003
 */
export function coefficientUncertainty(input: CoefficientUncertaintyInput): CoefficientUncertainty {
  const { coefficient: c, correctedDynamicPressure: qc, dynamicPressure: q, referenceArea: s, sampleCount: n } = input;
  const length = input.referenceLength ?? 1;
  if (!(qc > 0 && q > 0 && s > 0 && length > 0 && n >= 1)) {
    throw new RangeError(`\`coefficientUncertainty\` requires positive q, q_c, S, L and N; got q ${q} Pa, q_c ${qc} Pa, S ${s} m², L ${length} m, N ${n}`);
  }
  const sensitivities = {
    load: 1 / (qc * s * length),
    dynamicPressure: -c / q,
    referenceArea: -c / s,
    referenceLength: input.referenceLength === undefined ? 0 : -c / length,
  };
  const systematic = combinedStandardUncertainty([
    { sensitivity: sensitivities.load, standardUncertainty: input.loadUncertainty },
    { sensitivity: sensitivities.dynamicPressure, standardUncertainty: input.dynamicPressureUncertainty },
    { sensitivity: sensitivities.referenceArea, standardUncertainty: input.referenceAreaUncertainty },
    { sensitivity: sensitivities.referenceLength, standardUncertainty: input.referenceLengthUncertainty ?? 0 },
  ]);
  const random = input.sampleStandardDeviation / Math.sqrt(n);
  const combined = combinedStandardUncertainty([
    { sensitivity: 1, standardUncertainty: systematic },
    { sensitivity: 1, standardUncertainty: random },
  ]);
  const biasLimit = 2 * systematic;
  const precision = precisionLimit(input.sampleStandardDeviation, n);
  return {
    sensitivities,
    systematicStandardUncertainty: systematic,
    randomStandardUncertainty: random,
    combinedStandardUncertainty: combined,
    expandedUncertainty: expandedUncertainty(combined, 2),
    biasLimit,
    precisionLimit: precision,
    u95: u95(biasLimit, precision),
  };
}
