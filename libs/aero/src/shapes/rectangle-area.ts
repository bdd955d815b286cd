import { requireNonNegative } from '../errors/require-number';

/**
 * Rectangle area: the product of the two sides. Used for the frontal area of an extruded section,
 * span length × frontal height (per unit span the reference length is the frontal height).
 *
 * Source: definition of the reference area A = b·D for two-dimensional bodies in B. R. Munson, D. F. Young,
 * T. H. Okiishi, W. W. Huebsch, *Fundamentals of Fluid Mechanics*, Wiley, Fig. 9.19 (`b = length`).
 *
 * @param first one side, m
 * @param second the other side, m
 * @returns area, m²
 * @throws {AeroInputError} `NOT_FINITE` or `OUT_OF_RANGE` when a side is not finite or negative
 * @example rectangleArea(2, 0.05) // 0.1
 */
export function rectangleArea(first: number, second: number): number {
  return requireNonNegative('rectangleArea', 'side', first, 'm') * requireNonNegative('rectangleArea', 'side', second, 'm');
}
