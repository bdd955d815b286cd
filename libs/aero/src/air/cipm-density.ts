import { requireFraction } from '../errors/require-number';
import {
  CIPM_CO2_MOLAR_MASS_TERM,
  CIPM_DRY_AIR_MOLAR_MASS,
  CIPM_GAS_CONSTANT,
  CIPM_REFERENCE_CO2_MOLE_FRACTION,
  CIPM_WATER_MOLAR_MASS,
} from './cipm-constants';
import { cipmCompressibility } from './cipm-compressibility';
import { cipmVapourMoleFraction } from './cipm-vapour-mole-fraction';
import type { CipmAirState } from './moist-air-state';

/**
 * Density of moist air, CIPM-2007 equation.
 *
 * ρ = p·M_a/(Z·R·T) · [1 − x_v·(1 − M_v/M_a)], with M_a = [28.96546 + 12.011·(x_CO2 − 0.0004)] g/mol,
 * x_v from relative humidity and Z the compressibility factor.
 *
 * Source: Picard et al. 2008, Metrologia 45:149 (CIPM-2007), eq. 1 (equation number from memory). Valid 600–1100 hPa and 15–27 °C; outside
 * that range it still returns a value, so check {@link isWithinCipmValidity} and warn.
 *
 * @param state - pressure (Pa), temperature (K), relative humidity (fraction 0–1), CO2 mole fraction (default 0.0004)
 * @returns density ρ, kg/m³
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity; `OUT_OF_RANGE` for p ≤ 0, T ≤ 0, RH or x_CO2 outside 0–1
 * @example
 * cipmDensity({ pressure: 101325, temperature: 293.15, relativeHumidity: 0.5 }); // ≈ 1.199314 kg/m³
 */
export function cipmDensity(state: CipmAirState): number {
  const { pressure, temperature, co2MoleFraction = CIPM_REFERENCE_CO2_MOLE_FRACTION } = state;
  requireFraction('cipmDensity', 'CO2 mole fraction', co2MoleFraction);
  const vapour = cipmVapourMoleFraction(state);
  const dryMolarMass = CIPM_DRY_AIR_MOLAR_MASS + CIPM_CO2_MOLAR_MASS_TERM * (co2MoleFraction - CIPM_REFERENCE_CO2_MOLE_FRACTION);
  const z = cipmCompressibility(pressure, temperature, vapour);
  return ((pressure * dryMolarMass) / (z * CIPM_GAS_CONSTANT * temperature)) * (1 - vapour * (1 - CIPM_WATER_MOLAR_MASS / dryMolarMass));
}
