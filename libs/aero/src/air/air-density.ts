import { AeroInputError } from '../errors/aero-input-error';
import { cipmDensity } from './cipm-density';
import { idealGasDensity } from './ideal-gas-density';
import type { CipmAirState } from './moist-air-state';

/** Names of the moist-air density models a facility can choose. */
export type AirDensityModel = 'cipm-2007' | 'ideal-gas-buck';

/** The density models, in the order a settings screen lists them. */
export const AIR_DENSITY_MODELS: readonly AirDensityModel[] = Object.freeze(['cipm-2007', 'ideal-gas-buck']);

/**
 * Density of moist air by the named model.
 * - `cipm-2007`: {@link cipmDensity} (Picard et al. 2008, Metrologia 45:149).
 * - `ideal-gas-buck`: {@link idealGasDensity} (ideal-gas mixture with Buck 1981 e_s).
 *
 * @param model - which model to use
 * @param state - pressure (Pa), temperature (K), relative humidity (fraction 0–1), optional CO2 mole fraction
 * @returns density ρ, kg/m³
 * @throws {AeroInputError} `UNKNOWN_ID` for an unknown model name, else what the chosen model throws
 * @example
 * airDensity('cipm-2007', { pressure: 101325, temperature: 293.15, relativeHumidity: 0.5 }); // ≈ 1.199314
 */
export function airDensity(model: AirDensityModel, state: CipmAirState): number {
  switch (model) {
    case 'cipm-2007':
      return cipmDensity(state);
    case 'ideal-gas-buck':
      return idealGasDensity(state);
    default:
      throw new AeroInputError('UNKNOWN_ID', `\`airDensity\` requires a model of ${AIR_DENSITY_MODELS.join(' or ')}; got ${String(model)}`);
  }
}
