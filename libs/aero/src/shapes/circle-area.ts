/**
 * Circle area from its diameter: π times the diameter squared, divided by four.
 * The frontal area of a sphere, disk, cone base or body of revolution.
 *
 * Source: geometry; the reference area A = πD²/4 used for bodies of revolution in B. R. Munson et al.,
 * *Fundamentals of Fluid Mechanics*, Wiley, Fig. 9.20.
 *
 * @param diameter diameter, m
 * @returns area, m²
 * @throws {RangeError} when the diameter is negative or not finite
 * @example circleArea(2) // 3.14159…
 */
export function circleArea(diameter: number): number {
  if (!Number.isFinite(diameter) || diameter < 0) {
    throw new RangeError(`circleArea requires a finite, non-negative diameter (got ${diameter})`);
  }
  return (Math.PI * diameter * diameter) / 4;
}
