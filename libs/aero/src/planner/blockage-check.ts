import { frontalAreaSolidBlockage } from '../corrections';
import { requireNonNegative, requirePositive } from '../errors/require-number';
import type { FitCheck } from './fit-check';
import { BLOCKAGE_FAIL_RATIO, BLOCKAGE_WARN_RATIO } from './fit-thresholds';

/** Inputs of {@link blockageCheck}. */
export interface BlockageInput {
  /** Projected frontal area of the model, m². */
  modelFrontalArea: number;
  /** Test-section cross-section area, m². */
  sectionArea: number;
  /** Labels of parts whose frontal area is unknown and so not counted. */
  uncountedParts?: readonly string[];
}

const percent = (ratio: number): string => `${(ratio * 100).toFixed(2)} %`;

/**
 * Blockage check: model frontal area divided by test-section area, against the rules of thumb of 7.5 % and 10 %.
 * Passes below 7.5 %; warns from 7.5 % inclusive up to 10 % inclusive; fails above 10 %. Also warns (at least) when
 * some parts' frontal areas are unknown.
 *
 * Source: thresholds from J. B. Barlow, W. H. Rae, A. Pope, *Low-Speed Wind Tunnel Testing*, 3rd ed., 1999
 * (attribution from memory); the ratio is a definition; the q correction quoted in the reason is the frontal-area
 * shortcut of `frontalAreaSolidBlockage` (same book, ch. 10).
 *
 * @param input model frontal area (m²), section area (m²), parts not counted
 * @returns check `blockage`, value = ratio (dimensionless)
 * @throws {AeroInputError} `NOT_FINITE` or `OUT_OF_RANGE` when the section area is not positive or the model area is negative
 * @example blockageCheck({ modelFrontalArea: 0.05, sectionArea: 1 }).status // 'pass'
 */
export function blockageCheck(input: BlockageInput): FitCheck {
  const sectionArea = requirePositive('blockageCheck', 'section area', input.sectionArea, 'm²');
  const modelFrontalArea = requireNonNegative('blockageCheck', 'model frontal area', input.modelFrontalArea, 'm²');
  const ratio = modelFrontalArea / sectionArea;
  const uncounted = input.uncountedParts ?? [];
  const missing = uncounted.length > 0 ? ` Frontal area unknown and not counted for: ${uncounted.join(', ')}.` : '';
  // The frontal-area shortcut ε ≈ ¼·A/C (corrections/frontalAreaSolidBlockage) is only defined for 0 < A < C.
  const correction =
    modelFrontalArea > 0 && modelFrontalArea < sectionArea
      ? ` Expected closed-section q correction (1 + ε)² ≈ ${((1 + frontalAreaSolidBlockage({ frontalArea: modelFrontalArea, sectionArea })) ** 2).toFixed(3)}.`
      : '';
  if (ratio > BLOCKAGE_FAIL_RATIO) {
    return {
      id: 'blockage',
      status: 'fail',
      value: ratio,
      reason: `Blockage ${percent(ratio)} is above ${percent(BLOCKAGE_FAIL_RATIO)}: corrections become large and uncertain; use a smaller scale or a larger section.${correction}${missing}`,
    };
  }
  if (ratio >= BLOCKAGE_WARN_RATIO) {
    return {
      id: 'blockage',
      status: 'warn',
      value: ratio,
      reason: `Blockage ${percent(ratio)} is at or above ${percent(BLOCKAGE_WARN_RATIO)} (limit ${percent(BLOCKAGE_FAIL_RATIO)}): blockage corrections will be significant.${correction}${missing}`,
    };
  }
  return {
    id: 'blockage',
    status: uncounted.length > 0 ? 'warn' : 'pass',
    value: ratio,
    reason: `Blockage ${percent(ratio)} is below ${percent(BLOCKAGE_WARN_RATIO)}.${correction}${missing}`,
  };
}
