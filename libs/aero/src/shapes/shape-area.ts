import { requirePositive } from '../errors/require-number';
import type { AreaRule, ShapeDimensions } from './shape-entry';

/**
 * Evaluates an area rule of a library entry after checking the dimensions it reads.
 *
 * Source: the rule's own formula (see `AreaRule.formula`).
 *
 * @param rule area rule of a library entry
 * @param dimensions the part's dimensions, m (or m² for `frontalArea`)
 * @returns area, m²
 * @throws {AeroInputError} `NOT_FINITE` or `OUT_OF_RANGE` when a dimension the rule reads is missing, not finite, or not positive
 * @example shapeArea(findShape('circular-cylinder-cross-flow').referenceArea, { length: 2, diameter: 0.05 }) // 0.1
 */
export function shapeArea(rule: AreaRule, dimensions: ShapeDimensions): number {
  for (const name of rule.dimensions) {
    requirePositive('shapeArea', `${name} (for ${rule.formula})`, dimensions[name] ?? Number.NaN, name === 'frontalArea' ? 'm²' : 'm');
  }
  return rule.area(dimensions);
}
