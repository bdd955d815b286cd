import { AeroInputError } from '../errors/aero-input-error';
import { requireFinite } from '../errors/require-number';

/**
 * Checks a total blockage factor: finite and above −1 (so that 1 + ε stays positive).
 * Negative values are allowed because an open jet's expansion term lowers the velocity.
 *
 * @param fn - calling function, for the message
 * @param blockage - total blockage factor ε (dimensionless)
 * @returns the same ε
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for ε ≤ −1
 * @example
 * requireBlockage('correctedSpeed', 0.01); // 0.01
 */
export function requireBlockage(fn: string, blockage: number): number {
  requireFinite(fn, 'total blockage', blockage, '');
  if (blockage <= -1) {
    throw new AeroInputError('OUT_OF_RANGE', `\`${fn}\` requires a total blockage above −1; got ${blockage}`);
  }
  return blockage;
}
