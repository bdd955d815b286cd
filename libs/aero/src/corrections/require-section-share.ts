import { AeroInputError } from '../errors/aero-input-error';
import { requirePositive } from '../errors/require-number';

/**
 * Checks a model area against the test-section area and returns their ratio.
 *
 * @param fn - calling function, for the message
 * @param what - which model area, e.g. "frontal area"
 * @param modelArea - the model's area, m²
 * @param sectionArea - test-section cross-section area, m²
 * @returns modelArea / sectionArea (dimensionless, 0–1)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for areas ≤ 0 or a model area
 *   at least as large as the section
 * @example
 * requireSectionShare('frontalAreaSolidBlockage', 'frontal area', 0.3, 6); // 0.05
 */
export function requireSectionShare(fn: string, what: string, modelArea: number, sectionArea: number): number {
  requirePositive(fn, what, modelArea, 'm²');
  requirePositive(fn, 'test-section area', sectionArea, 'm²');
  if (modelArea >= sectionArea) {
    throw new AeroInputError('OUT_OF_RANGE', `\`${fn}\` requires a ${what} smaller than the test-section area; got ${modelArea} m² in ${sectionArea} m²`);
  }
  return modelArea / sectionArea;
}
