import { morrisonCommonTerms } from './morrison-terms';
import { requireReynoldsNumber, type ReynoldsRange } from './reynolds-range';

/** Range of {@link sphereDragMorrison}: creeping flow up to Re = 1e6 (Morrison 2013). */
export const SPHERE_DRAG_MORRISON_RANGE: ReynoldsRange = Object.freeze({ min: 0, max: 1e6 });

/**
 * Drag coefficient of a smooth sphere, Morrison's 2013 correlation.
 *
 * C_D = 24/Re + 2.6·(Re/5)/[1 + (Re/5)^1.52] + 0.411·(Re/2.63e5)^−7.94/[1 + (Re/2.63e5)^−8]
 *       + 0.25·(Re/1e6)/(1 + Re/1e6).
 * It falls through 0.3 at Re ≈ 2.518e5 and bottoms out near 0.090 at Re ≈ 4.4e5.
 *
 * Source: Morrison 2013, "Data Correlation for Drag Coefficient for Sphere", Department of Chemical Engineering,
 * Michigan Technological University (title from memory). Valid to Re = 1e6.
 *
 * @param reynoldsNumber - Reynolds number based on diameter (dimensionless)
 * @returns drag coefficient C_D on frontal area πd²/4 (dimensionless)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for Re ≤ 0
 * @example
 * sphereDragMorrison(1e4); // ≈ 0.3926
 */
export function sphereDragMorrison(reynoldsNumber: number): number {
  const re = requireReynoldsNumber('sphereDragMorrison', reynoldsNumber);
  const high = re / 1e6;
  return morrisonCommonTerms(re) + (0.25 * high) / (1 + high);
}
