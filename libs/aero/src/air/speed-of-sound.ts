import { requirePositive } from '../errors/require-number';
import { ISA_GAS_CONSTANT, ISA_HEAT_CAPACITY_RATIO } from './isa-sea-level';

/**
 * Speed of sound in a perfect gas: a = √(γ·R·T).
 * Source: U.S. Standard Atmosphere 1976, eq. 50 (equation number from memory); γ = 1.4 and R = 287.05287 J/(kg·K).
 *
 * @param temperature - thermodynamic temperature T, K
 * @param gamma - ratio of specific heats γ (dimensionless), default 1.4
 * @param gasConstant - specific gas constant R, J/(kg·K), default 287.05287
 * @returns speed of sound a, m/s
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for T, γ or R ≤ 0
 * @example
 * speedOfSound(288.15); // ≈ 340.294 m/s
 */
export function speedOfSound(temperature: number, gamma = ISA_HEAT_CAPACITY_RATIO, gasConstant = ISA_GAS_CONSTANT): number {
  requirePositive('speedOfSound', 'temperature', temperature, 'K');
  requirePositive('speedOfSound', 'ratio of specific heats', gamma, '');
  requirePositive('speedOfSound', 'gas constant', gasConstant, 'J/(kg·K)');
  return Math.sqrt(gamma * gasConstant * temperature);
}
