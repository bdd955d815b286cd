import { requireFinite, requirePositive } from '../errors/require-number';
import { PLANNER_CAUTION } from './planner-caution';

/** Result of {@link compareWithMeasured}. */
export interface MeasuredComparison {
  /** (estimated − measured) / measured × 100, %. */
  differencePercent: number;
  caution: string;
}

/**
 * Difference between a planner estimate and a measured drag area, in percent of the measured value:
 * (estimated − measured) / measured × 100. Positive when the planner over-estimates.
 *
 * Source: definition (relative difference).
 *
 * @param estimatedDragArea planner C_D·A, m²
 * @param measuredDragArea measured C_D·A, m²
 * @returns difference, %, with the planner caution
 * @throws {AeroInputError} `NOT_FINITE` or `OUT_OF_RANGE` when either value is not finite, or the measured value is not positive
 * @example compareWithMeasured(0.33, 0.3).differencePercent // 10
 */
export function compareWithMeasured(estimatedDragArea: number, measuredDragArea: number): MeasuredComparison {
  const estimated = requireFinite('compareWithMeasured', 'estimated drag area', estimatedDragArea, 'm²');
  const measured = requirePositive('compareWithMeasured', 'measured drag area', measuredDragArea, 'm²');
  return { differencePercent: ((estimated - measured) / measured) * 100, caution: PLANNER_CAUTION };
}
