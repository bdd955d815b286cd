import { requireNonNegative, requirePositive } from '../errors/require-number';
import { requireSectionShare } from './require-section-share';

/** Maskell's blockage constant θ for three-dimensional bluff bodies, ≈ 5/2 (Maskell 1963, ARC R&M 3400). */
export const MASKELL_THETA = 2.5;

/** Inputs of {@link maskellDynamicPressureRatio}. */
export interface MaskellInput {
  /** Uncorrected drag coefficient C_Du (dimensionless, ≥ 0). */
  readonly uncorrectedDragCoefficient: number;
  /** Reference area S on which C_Du is based, m². */
  readonly referenceArea: number;
  /** Test-section cross-section area C, m². */
  readonly sectionArea: number;
  /** Blockage constant θ (dimensionless), default {@link MASKELL_THETA}. Not Thom's K (0.90/0.96). */
  readonly theta?: number;
}

/**
 * Maskell's bluff-body blockage: ratio of corrected to uncorrected dynamic pressure.
 *
 * q_c / q_u = 1 + θ · C_Du · S / C, with θ ≈ 5/2 in three dimensions.
 *
 * Source: Maskell 1963, "A theory of the blockage effects on bluff bodies and stalled wings in a closed wind
 * tunnel", ARC R&M 3400 (printed 1965); Barlow, Rae & Pope 1999, ch. 10.
 *
 * @param input - C_Du, reference area S (m²), section area C (m²), θ (default 2.5)
 * @returns q_c / q_u (dimensionless, ≥ 1)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity; `OUT_OF_RANGE` for areas ≤ 0, S ≥ C, C_Du < 0 or θ ≤ 0
 * @example
 * maskellDynamicPressureRatio({ uncorrectedDragCoefficient: 1.2, referenceArea: 0.2, sectionArea: 4 }); // 1.15
 */
export function maskellDynamicPressureRatio(input: MaskellInput): number {
  const fn = 'maskellDynamicPressureRatio';
  const drag = requireNonNegative(fn, 'uncorrected drag coefficient', input.uncorrectedDragCoefficient, '');
  const share = requireSectionShare(fn, 'reference area', input.referenceArea, input.sectionArea);
  const theta = requirePositive(fn, 'theta', input.theta ?? MASKELL_THETA, '');
  return 1 + theta * drag * share;
}
