/**
 * Moments transferred from the balance moment centre to the moment reference centre.
 *
 * M_ref = M_bal + r × F, where r is the position of the balance centre relative to the reference centre and
 * F = (Fx, Fy, Fz); forces are unchanged. Source: rigid-body statics (e.g. Meriam & Kraige, *Engineering
 * Mechanics: Statics*, moment of a force about a point), common practice for balance data.
 *
 * @param loads - Fx, Fy, Fz (N), Mx, My, Mz (N·m) about the balance centre; moments are replaced in place
 * @param offset - r = balance centre − moment reference centre, body axes, m
 * @returns `loads`, with moments about the moment reference centre
 * @throws nothing: NaN inputs give NaN moments
 * @example
 * transferMoments(Float64Array.of(0, 0, 10, 0, 0, 0), [0.5, 0, 0])[4]; // My = −(0.5 × 10) = −5 N·m
 */
export function transferMoments(loads: Float64Array, offset: readonly number[]): Float64Array {
  const [rx, ry, rz] = offset;
  const fx = loads[0];
  const fy = loads[1];
  const fz = loads[2];
  loads[3] += ry * fz - rz * fy;
  loads[4] += rz * fx - rx * fz;
  loads[5] += rx * fy - ry * fx;
  return loads;
}
