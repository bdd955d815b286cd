import { requireReynoldsNumber, type ReynoldsRange } from './reynolds-range';

/** Range of {@link sphereDragCliftGauvin}: creeping flow up to Re = 3e5 (Clift & Gauvin 1970). */
export const SPHERE_DRAG_CLIFT_GAUVIN_RANGE: ReynoldsRange = Object.freeze({ min: 0, max: 3e5 });

/**
 * Drag coefficient of a smooth sphere, Clift–Gauvin correlation.
 *
 * C_D = (24/Re)·(1 + 0.15·Re^0.687) + 0.42/(1 + 4.25e4·Re^−1.16), for Re < 3e5 (subcritical only).
 *
 * Source: Clift & Gauvin 1970, "The motion of particles in turbulent gas streams", Proc. Chemeca '70, 1:14–28 (pages from memory);
 * also Clift, Grace & Weber 1978, Bubbles, Drops and Particles (other coefficient sets exist).
 *
 * @param reynoldsNumber - Reynolds number based on diameter (dimensionless)
 * @returns drag coefficient C_D on frontal area (dimensionless)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for Re ≤ 0
 * @example
 * sphereDragCliftGauvin(1e3); // ≈ 0.46615
 */
export function sphereDragCliftGauvin(reynoldsNumber: number): number {
  const re = requireReynoldsNumber('sphereDragCliftGauvin', reynoldsNumber);
  return (24 / re) * (1 + 0.15 * re ** 0.687) + 0.42 / (1 + 4.25e4 * re ** -1.16);
}
