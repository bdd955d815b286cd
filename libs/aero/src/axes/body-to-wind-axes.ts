/**
 * Body-axis forces resolved into wind axes: drag, lift and wind-axis side force.
 *
 * D = A·cosα·cosβ + N·sinα·cosβ − Y·sinβ;  L = N·cosα − A·sinα;  Y_w = A·cosα·sinβ + N·sinα·sinβ + Y·cosβ,
 * with A the axial force (positive aft), N the normal force (positive up), Y the side force (positive to
 * starboard), α the angle of attack and β the sideslip angle (positive with the wind from starboard).
 * Source: Etkin, *Dynamics of Atmospheric Flight*, 1972, and Stevens & Lewis, *Aircraft Control and
 * Simulation*, 2nd ed., 2003, body-to-wind rotation (from memory; see docs/methods.md for the diagram).
 *
 * @param axial - A, N
 * @param normal - N, N
 * @param side - Y, N
 * @param alpha - angle of attack α, rad
 * @param beta - sideslip β, rad (for a turntable yaw ψ, β = −ψ)
 * @param out - receives [D, L, Y_w], N
 * @returns `out`
 * @throws nothing: NaN inputs give NaN outputs
 * @example
 * bodyToWindAxes(10, 0, 0, 0, 0, new Float64Array(3)); // [10, 0, 0]
 */
export function bodyToWindAxes(axial: number, normal: number, side: number, alpha: number, beta: number, out: Float64Array): Float64Array {
  const ca = Math.cos(alpha);
  const sa = Math.sin(alpha);
  const cb = Math.cos(beta);
  const sb = Math.sin(beta);
  out[0] = axial * ca * cb + normal * sa * cb - side * sb;
  out[1] = normal * ca - axial * sa;
  out[2] = axial * ca * sb + normal * sa * sb + side * cb;
  return out;
}
