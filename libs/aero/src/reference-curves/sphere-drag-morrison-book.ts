import { morrisonCommonTerms } from './morrison-terms';
import { requireReynoldsNumber, type ReynoldsRange } from './reynolds-range';

/** Range of {@link sphereDragMorrisonBook}: creeping flow up to Re = 1e6 (Morrison 2013). */
export const SPHERE_DRAG_MORRISON_BOOK_RANGE: ReynoldsRange = Object.freeze({ min: 0, max: 1e6 });

/**
 * Drag coefficient of a smooth sphere, Morrison's fit (textbook form).
 *
 * C_D = 24/Re + 2.6·(Re/5)/[1 + (Re/5)^1.52] + 0.411·(Re/2.63e5)^−7.94/[1 + (Re/2.63e5)^−8] + Re^0.8/461 000.
 *
 * Source: Morrison 2013, An Introduction to Fluid Mechanics, Cambridge University Press (sphere-drag
 * correlation, equation number from memory). Valid to Re = 1e6.
 *
 * @param reynoldsNumber - Reynolds number based on diameter (dimensionless)
 * @returns drag coefficient C_D on frontal area (dimensionless)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for Re ≤ 0
 * @example
 * sphereDragMorrisonBook(200); // 0.767731559965325
 */
export function sphereDragMorrisonBook(reynoldsNumber: number): number {
  const re = requireReynoldsNumber('sphereDragMorrisonBook', reynoldsNumber);
  return morrisonCommonTerms(re) + re ** 0.8 / 461_000;
}
