import { requireReynoldsNumber, type ReynoldsRange } from './reynolds-range';

/** Range of {@link cylinderDragWhite}: 1 to 2e5 (White, Viscous Fluid Flow — from memory). */
export const CYLINDER_DRAG_WHITE_RANGE: ReynoldsRange = Object.freeze({ min: 1, max: 2e5 });

/**
 * Drag coefficient of a long smooth circular cylinder in cross-flow, White's curve fit.
 *
 * C_D = 1 + 10·Re^(−2/3), for 1 < Re < 2e5.
 *
 * Source: White, Viscous Fluid Flow, McGraw-Hill (cylinder drag fit; edition and equation number from memory).
 *
 * @param reynoldsNumber - Reynolds number based on diameter (dimensionless)
 * @returns drag coefficient C_D per unit span on the projected area d·b (dimensionless)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for Re ≤ 0
 * @example
 * cylinderDragWhite(1e3); // 1.1
 */
export function cylinderDragWhite(reynoldsNumber: number): number {
  const re = requireReynoldsNumber('cylinderDragWhite', reynoldsNumber);
  return 1 + 10 * re ** (-2 / 3);
}
