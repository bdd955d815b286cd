import { requireNonNegative } from '../errors/require-number';
import { requireSectionShare } from './require-section-share';

/** Inputs of {@link streamlinedWakeBlockage}. */
export interface StreamlinedWakeBlockageInput {
  /** Reference area S on which C_Du is based, m². */
  readonly referenceArea: number;
  /** Test-section cross-section area C, m². */
  readonly sectionArea: number;
  /** Uncorrected drag coefficient C_Du (dimensionless, ≥ 0). */
  readonly uncorrectedDragCoefficient: number;
}

/**
 * Wake blockage of a streamlined model in a closed test section.
 *
 * ε_wb = (S / 4C) · C_Du.
 *
 * Source: Barlow, Rae & Pope 1999, Low-Speed Wind Tunnel Testing, 3rd ed., ch. 10 (equation number from memory).
 *
 * @param input - reference area S (m²), section area C (m²), uncorrected drag coefficient C_Du
 * @returns wake-blockage factor ε_wb (dimensionless)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity; `OUT_OF_RANGE` for areas ≤ 0, S ≥ C or C_Du < 0
 * @example
 * streamlinedWakeBlockage({ referenceArea: 0.2, sectionArea: 4, uncorrectedDragCoefficient: 0.35 }); // 0.004375
 */
export function streamlinedWakeBlockage(input: StreamlinedWakeBlockageInput): number {
  const fn = 'streamlinedWakeBlockage';
  const share = requireSectionShare(fn, 'reference area', input.referenceArea, input.sectionArea);
  const drag = requireNonNegative(fn, 'uncorrected drag coefficient', input.uncorrectedDragCoefficient, '');
  return (share / 4) * drag;
}
