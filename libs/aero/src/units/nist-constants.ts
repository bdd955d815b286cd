/**
 * Exact unit definitions from NIST SP 811 (2008), Appendix B.
 * Each constant is the SI value of one of the named unit.
 */

/** International foot, m (exact). */
export const FOOT = 0.3048;
/** International inch, m (exact). */
export const INCH = 0.0254;
/** Statute mile per hour, m/s (exact: 1609.344 m / 3600 s). */
export const MILE_PER_HOUR = 0.44704;
/** Kilometre per hour, m/s (exact). */
export const KILOMETRE_PER_HOUR = 1000 / 3600;
/** International knot, m/s (exact: 1852 m / 3600 s). */
export const KNOT = 1852 / 3600;
/** Standard acceleration of gravity g_n, m/s² (exact). */
export const STANDARD_GRAVITY = 9.80665;
/** Avoirdupois pound, kg (exact). */
export const POUND_MASS = 0.45359237;
/** Pound-force, N (exact: 0.45359237 kg × 9.80665 m/s²). */
export const POUND_FORCE = POUND_MASS * STANDARD_GRAVITY;
/** Pound-force foot, N·m. */
export const POUND_FORCE_FOOT = POUND_FORCE * FOOT;
/** Pound-force per square foot, Pa. */
export const POUND_FORCE_PER_SQUARE_FOOT = POUND_FORCE / (FOOT * FOOT);
/** Inch of water at 39.2 °F, Pa: NIST SP 811 App. B.8 lists 249.082 Pa. (The conventional inch of water, 1000 kg/m³ × g_n × 25.4 mm, is 249.0889 Pa.) */
export const INCH_OF_WATER = 249.082;
/** Horsepower (550 ft·lbf/s), W. */
export const HORSEPOWER = 550 * POUND_FORCE_FOOT;
/** Offset between kelvin and degree Celsius. */
export const CELSIUS_ZERO = 273.15;
