import { AeroInputError } from '../errors/aero-input-error';
import type { MeasuredQuantity } from './measured-quantity';
import { relativeStandardUncertainty } from './relative-standard-uncertainty';

/** Inputs of {@link dynamicPressureRelativeUncertainty}. */
export interface DynamicPressureUncertaintyInput {
  /** Air density ρ, kg/m³, with its standard uncertainty. */
  readonly density: MeasuredQuantity;
  /** Airspeed V, m/s, with its standard uncertainty. */
  readonly speed: MeasuredQuantity;
}

/**
 * Relative standard uncertainty of dynamic pressure q = ½ρV², inputs uncorrelated.
 *
 * u_r(q)² = u_r(ρ)² + 4·u_r(V)² (the speed enters squared, so its relative uncertainty counts twice).
 *
 * Source: GUM, JCGM 100:2008, 5.1.6 (products of powers; clause number from memory).
 *
 * @param input - density (kg/m³) and speed (m/s), each with its standard uncertainty
 * @returns relative standard uncertainty u_r(q) (dimensionless)
 * @throws {AeroInputError} `ZERO_WIND` for V ≤ 0; `OUT_OF_RANGE` for ρ ≤ 0 or a negative uncertainty;
 *   `NOT_FINITE` for NaN or ±Infinity
 * @example
 * dynamicPressureRelativeUncertainty({ density: { value: 1.2, standardUncertainty: 0.0036 }, speed: { value: 30, standardUncertainty: 0.06 } }); // 0.005
 */
export function dynamicPressureRelativeUncertainty(input: DynamicPressureUncertaintyInput): number {
  const fn = 'dynamicPressureRelativeUncertainty';
  if (input.speed.value <= 0) {
    throw new AeroInputError('ZERO_WIND', `\`${fn}\` requires a positive speed; got ${input.speed.value} m/s (is the wind on?)`);
  }
  if (input.density.value <= 0) {
    throw new AeroInputError('OUT_OF_RANGE', `\`${fn}\` requires a positive density; got ${input.density.value} kg/m³`);
  }
  const density = relativeStandardUncertainty(fn, 'density', input.density);
  const speed = relativeStandardUncertainty(fn, 'speed', input.speed);
  return Math.hypot(density, 2 * speed);
}
