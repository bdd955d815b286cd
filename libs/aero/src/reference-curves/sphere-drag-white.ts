import { requireReynoldsNumber, type ReynoldsRange } from './reynolds-range';

/** Range of {@link sphereDragWhite}: 0 to 2e5 (White, Viscous Fluid Flow — from memory). */
export const SPHERE_DRAG_WHITE_RANGE: ReynoldsRange = Object.freeze({ min: 0, max: 2e5 });

/**
 * Drag coefficient of a smooth sphere, White's curve fit.
 *
 * C_D = 24/Re + 6/(1 + √Re) + 0.4, for Re ≤ 2e5.
 *
 * Source: White, Viscous Fluid Flow, McGraw-Hill (sphere drag fit; edition and equation number from memory).
 *
 * @param reynoldsNumber - Reynolds number based on diameter (dimensionless)
 * @returns drag coefficient C_D on frontal area (dimensionless)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for Re ≤ 0
 * @example
 * sphereDragWhite(100); // ≈ 1.18545
 */
export function sphereDragWhite(reynoldsNumber: number): number {
  const re = requireReynoldsNumber('sphereDragWhite', reynoldsNumber);
  return 24 / re + 6 / (1 + Math.sqrt(re)) + 0.4;
}
