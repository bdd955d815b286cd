import { AeroInputError } from '../errors/aero-input-error';

/** A weight-tare table: six loads at each (yaw, pitch) breakpoint. */
export interface TareTable {
  /** Yaw breakpoints, rad, increasing. */
  yaw: readonly number[];
  /** Pitch breakpoints, rad, increasing. */
  pitch: readonly number[];
  /** loads[yawIndex][pitchIndex] = Fx, Fy, Fz (N), Mx, My, Mz (N·m). */
  loads: readonly (readonly (readonly number[])[])[];
}

/**
 * Weight tare at one attitude, bilinear interpolation in yaw and pitch.
 *
 * T = (1−u)(1−v)·T00 + u(1−v)·T10 + (1−u)v·T01 + uv·T11, with u, v the fractional positions of the attitude in
 * its yaw and pitch cells. A table with one breakpoint in a direction is constant in that direction.
 * Source: Press et al., *Numerical Recipes*, 3rd ed., 2007, §3.6 (bilinear interpolation).
 *
 * @param table - the tare table (angles in rad)
 * @param yaw - yaw ψ, rad
 * @param pitch - pitch θ, rad
 * @param out - receives the six tare loads, N and N·m
 * @returns `out`
 * @throws {AeroInputError} `NOT_COVERED` when the attitude lies outside the table (no extrapolation)
 * @example
 * interpolateTare({ yaw: [0, 1], pitch: [0], loads: [[[0,0,0,0,0,0]], [[2,0,0,0,0,0]]] }, 0.5, 0, new Float64Array(6))[0]; // 1
 */
export function interpolateTare(table: TareTable, yaw: number, pitch: number, out: Float64Array): Float64Array {
  // Index and fraction are computed apart (no tuple) so that a call allocates nothing.
  const i = cellIndex('yaw', table.yaw, yaw);
  const j = cellIndex('pitch', table.pitch, pitch);
  const u = cellFraction(table.yaw, i, yaw);
  const v = cellFraction(table.pitch, j, pitch);
  const i1 = u > 0 ? i + 1 : i;
  const j1 = v > 0 ? j + 1 : j;
  const t00 = table.loads[i][j];
  const t10 = table.loads[i1][j];
  const t01 = table.loads[i][j1];
  const t11 = table.loads[i1][j1];
  for (let k = 0; k < 6; k++) out[k] = (1 - u) * (1 - v) * t00[k] + u * (1 - v) * t10[k] + (1 - u) * v * t01[k] + u * v * t11[k];
  return out;
}

/** Index of the first breakpoint of the cell holding x. */
function cellIndex(what: string, breakpoints: readonly number[], x: number): number {
  const last = breakpoints.length - 1;
  const tolerance = 1e-12;
  if (!(x >= breakpoints[0] - tolerance && x <= breakpoints[last] + tolerance)) {
    const deg = (r: number) => ((r * 180) / Math.PI).toFixed(3);
    throw new AeroInputError('NOT_COVERED', `\`interpolateTare\` requires a ${what} inside the tare table (${deg(breakpoints[0])}…${deg(breakpoints[last])} deg); got ${deg(x)} deg`);
  }
  let i = 0;
  while (i < last - 1 && x > breakpoints[i + 1]) i++;
  return i;
}

/** Fractional position of x in the cell starting at breakpoint i, clamped to 0…1 (0 for a single breakpoint). */
function cellFraction(breakpoints: readonly number[], i: number, x: number): number {
  if (breakpoints.length === 1) return 0;
  const u = (x - breakpoints[i]) / (breakpoints[i + 1] - breakpoints[i]);
  return Math.min(1, Math.max(0, u));
}
