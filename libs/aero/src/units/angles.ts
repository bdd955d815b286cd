/** One degree of arc, rad (exact: π/180; NIST SP 811 App. B.8). */
export const DEGREE = Math.PI / 180;

/**
 * Degrees to radians: θ_rad = θ_deg · π/180.
 * Source: NIST SP 811 (2008) App. B.8, degree (°) to radian.
 *
 * @param degrees - angle, degrees
 * @returns angle, rad
 * @example
 * degreesToRadians(180); // Math.PI
 */
export function degreesToRadians(degrees: number): number {
  return degrees * DEGREE;
}

/**
 * Radians to degrees: θ_deg = θ_rad · 180/π.
 * Source: NIST SP 811 (2008) App. B.8.
 *
 * @param radians - angle, rad
 * @returns angle, degrees
 * @example
 * radiansToDegrees(Math.PI); // 180
 */
export function radiansToDegrees(radians: number): number {
  return radians / DEGREE;
}
