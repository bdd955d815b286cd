/** Specific gas constant of dry air in the US Standard Atmosphere 1976, J/(kg·K) (R-star over M0: 8314.32/28.9644). */
export const ISA_GAS_CONSTANT = 287.05287;
/** Ratio of specific heats of air used by the standard atmosphere. */
export const ISA_HEAT_CAPACITY_RATIO = 1.4;

/**
 * Sea-level values of the International Standard Atmosphere, identical to the US Standard Atmosphere 1976
 * and ICAO Doc 7488 at sea level (values from memory; widely reproduced).
 */
export const ISA_SEA_LEVEL = Object.freeze({
  /** Temperature, K. */
  temperature: 288.15,
  /** Pressure, Pa. */
  pressure: 101_325,
  /** Density, kg/m³. */
  density: 1.225,
  /** Dynamic viscosity, Pa·s. */
  viscosity: 1.7894e-5,
  /** Kinematic viscosity, m²/s. */
  kinematicViscosity: 1.4607e-5,
  /** Speed of sound, m/s. */
  speedOfSound: 340.294,
});
