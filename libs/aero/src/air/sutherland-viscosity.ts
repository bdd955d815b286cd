import { requirePositive } from '../errors/require-number';

/** Sutherland constant β of the US Standard Atmosphere 1976, kg/(m·s·K^½). */
export const SUTHERLAND_BETA = 1.458e-6;
/** Sutherland temperature S, K. */
export const SUTHERLAND_TEMPERATURE = 110.4;
/** Reference viscosity of the equivalent form μ = μ_ref·(T/T_ref)^1.5·(T_ref + S)/(T + S), Pa·s. */
export const SUTHERLAND_REFERENCE_VISCOSITY = 1.716e-5;
/** Reference temperature of that equivalent form, K. */
export const SUTHERLAND_REFERENCE_TEMPERATURE = 273.15;

/**
 * Dynamic viscosity of air, Sutherland's law.
 *
 * μ = β·T^1.5/(T + S), with β = 1.458e-6 kg/(m·s·K^½) and S = 110.4 K.
 *
 * Source: U.S. Standard Atmosphere 1976 (NOAA/NASA/USAF), eq. 51 (equation number from memory).
 *
 * @param temperature - thermodynamic temperature T, K
 * @returns dynamic viscosity μ, Pa·s
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for T ≤ 0 K
 * @example
 * sutherlandViscosity(288.15); // ≈ 1.78938e-5 Pa·s
 */
export function sutherlandViscosity(temperature: number): number {
  requirePositive('sutherlandViscosity', 'temperature', temperature, 'K');
  return (SUTHERLAND_BETA * temperature ** 1.5) / (temperature + SUTHERLAND_TEMPERATURE);
}
