/**
 * Constants of the CIPM-2007 equation for the density of moist air.
 * Source: Picard, Davis, Gläser & Fujii 2008, "Revised formula for the density of moist air (CIPM-2007)",
 * Metrologia 45:149–155.
 */

/** Molar gas constant used by CIPM-2007, J/(mol·K). */
export const CIPM_GAS_CONSTANT = 8.314472;
/** Molar mass of dry air at 400 µmol/mol CO2, kg/mol. */
export const CIPM_DRY_AIR_MOLAR_MASS = 28.96546e-3;
/** Molar mass of carbon in the CO2 term of M_a, kg/mol (M_a rises by 12.011e-3·(x_CO2 − 0.0004)). */
export const CIPM_CO2_MOLAR_MASS_TERM = 12.011e-3;
/** CO2 mole fraction at which M_a = 28.96546 g/mol. */
export const CIPM_REFERENCE_CO2_MOLE_FRACTION = 0.0004;
/** Molar mass of water, kg/mol. */
export const CIPM_WATER_MOLAR_MASS = 18.01528e-3;

/** Coefficients A (K⁻²), B (K⁻¹), C (1), D (K) of p_sv = exp(A·T² + B·T + C + D/T), Pa. */
export const CIPM_SATURATION_COEFFICIENTS = Object.freeze({
  A: 1.2378847e-5,
  B: -1.9121316e-2,
  C: 33.93711047,
  D: -6.3431645e3,
});

/** Coefficients α (1), β (Pa⁻¹), γ (°C⁻²) of the enhancement factor f = α + β·p + γ·t². */
export const CIPM_ENHANCEMENT_COEFFICIENTS = Object.freeze({
  alpha: 1.00062,
  beta: 3.14e-8,
  gamma: 5.6e-7,
});

/** Coefficients of the compressibility factor Z (units K/Pa, K/(Pa·°C), …, as in Picard et al. 2008 Table). */
export const CIPM_COMPRESSIBILITY_COEFFICIENTS = Object.freeze({
  a0: 1.58123e-6,
  a1: -2.9331e-8,
  a2: 1.1043e-10,
  b0: 5.707e-6,
  b1: -2.051e-8,
  c0: 1.9898e-4,
  c1: -2.376e-6,
  d: 1.83e-11,
  e: -0.765e-8,
});
