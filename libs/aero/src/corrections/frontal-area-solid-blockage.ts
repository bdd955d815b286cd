import { requireSectionShare } from './require-section-share';

/** Inputs of {@link frontalAreaSolidBlockage}. */
export interface FrontalAreaSolidBlockageInput {
  /** Model frontal area A, m². */
  readonly frontalArea: number;
  /** Test-section cross-section area C, m². */
  readonly sectionArea: number;
}

/**
 * Total blockage from frontal area, the quick shortcut for closed test sections.
 *
 * ε_t ≈ ¼ · A / C; then q_c = q_u·(1 + ε_t)².
 *
 * Source: Barlow, Rae & Pope 1999, Low-Speed Wind Tunnel Testing, 3rd ed., ch. 10 (the "Pope" frontal-area
 * shortcut; a report applying it gives a q factor of 1.024 for A = 3.06 ft², C = 64.5 ft²).
 *
 * @param input - frontal area A (m²) and test-section area C (m²)
 * @returns blockage factor ε (dimensionless velocity increment)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for areas ≤ 0 or A ≥ C
 * @example
 * frontalAreaSolidBlockage({ frontalArea: 3.06, sectionArea: 64.5 }); // ≈ 0.011860
 */
export function frontalAreaSolidBlockage(input: FrontalAreaSolidBlockageInput): number {
  return 0.25 * requireSectionShare('frontalAreaSolidBlockage', 'frontal area', input.frontalArea, input.sectionArea);
}
