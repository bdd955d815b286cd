/**
 * The first three terms of Morrison's sphere-drag fit, shared by the two published variants:
 * 24/Re + 2.6·(Re/5)/[1 + (Re/5)^1.52] + 0.411·(Re/2.63e5)^−7.94/[1 + (Re/2.63e5)^−8].
 * Source: Morrison 2013, An Introduction to Fluid Mechanics, Cambridge University Press, and Morrison's 2013
 * correlation note for sphere drag (Michigan Technological University).
 *
 * @param reynoldsNumber - Reynolds number based on diameter, already checked positive
 * @returns the sum of the three terms (dimensionless)
 * @example
 * morrisonCommonTerms(200); // ≈ 0.767581
 */
export function morrisonCommonTerms(reynoldsNumber: number): number {
  const re = reynoldsNumber;
  const low = re / 5;
  const crisis = re / 2.63e5;
  return 24 / re + (2.6 * low) / (1 + low ** 1.52) + (0.411 * crisis ** -7.94) / (1 + crisis ** -8);
}
