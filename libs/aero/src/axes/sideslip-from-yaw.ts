/**
 * Sideslip angle of a model yawed on a turntable: β = −ψ.
 *
 * Turning the model nose-to-starboard by ψ (clockwise seen from above) puts the wind on its port side,
 * which is negative sideslip. Source: sign convention of docs/methods.md (common practice).
 *
 * @param yaw - turntable yaw ψ, rad, positive nose to starboard
 * @returns sideslip β, rad
 * @throws nothing
 * @example
 * sideslipFromYaw(0.1); // −0.1
 */
export function sideslipFromYaw(yaw: number): number {
  return -yaw;
}
