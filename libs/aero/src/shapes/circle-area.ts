import { requireNonNegative } from '../errors/require-number';

/**
 * Circle area from its diameter: π times the diameter squared, divided by four.
 * The frontal area of a sphere, disk, cone base or body of revolution.
 *
 * Source: geometry; the reference area A = πD²/4 used for bodies of revolution in B. R. Munson et al.,
 * *Fundamentals of Fluid Mechanics*, Wiley, Fig. 9.20.
 *
 * @param diameter diameter, m
 * @returns area, m²
 * @throws {AeroInputError} `NOT_FINITE` or `OUT_OF_RANGE` when the diameter is not finite or negative
 * @example circleArea(2) // 3.14159…
 */
export function circleArea(diameter: number): number {
  const d = requireNonNegative('circleArea', 'diameter', diameter, 'm');
  return (Math.PI * d * d) / 4;
}
