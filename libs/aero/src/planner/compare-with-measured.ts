/**
 * Difference between a planner estimate and a measured drag area, in percent of the measured value:
 * (estimated − measured) / measured × 100. Positive when the planner over-estimates.
 *
 * Source: definition (relative difference).
 *
 * @param estimatedDragArea planner C_D·A, m²
 * @param measuredDragArea measured C_D·A, m²
 * @returns difference, %
 * @throws {RangeError} when either value is not finite, or the measured value is not positive
 * @example compareWithMeasured(0.33, 0.3) // 10
 */
export function compareWithMeasured(estimatedDragArea: number, measuredDragArea: number): number {
  if (!Number.isFinite(estimatedDragArea) || !Number.isFinite(measuredDragArea) || measuredDragArea <= 0) {
    throw new RangeError(
      `compareWithMeasured requires finite drag areas and a positive measured value (got ${estimatedDragArea}, ${measuredDragArea})`,
    );
  }
  return ((estimatedDragArea - measuredDragArea) / measuredDragArea) * 100;
}
