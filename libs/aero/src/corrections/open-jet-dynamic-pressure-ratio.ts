import { requireFinite } from '../errors/require-number';
import { requireBlockage } from './require-blockage';

/** Inputs of {@link openJetDynamicPressureRatio}: the three velocity increments, each stored per facility. */
export interface OpenJetBlockageInput {
  /** Jet-expansion increment ε_s (dimensionless; usually negative). */
  readonly jetExpansion: number;
  /** Nozzle-blockage increment ε_n (dimensionless). */
  readonly nozzleBlockage: number;
  /** Collector-blockage increment ε_c (dimensionless). */
  readonly collectorBlockage: number;
}

/**
 * Open-jet dynamic-pressure ratio from the summed interference increments.
 *
 * q_c / q_m = (1 + ε_s + ε_n + ε_c)².
 *
 * Source: Mercker & Wickern 1996, SAE 960671 (structure of the correction; structure from memory). The
 * individual ε values come from the facility's own calibration, not from this function.
 *
 * @param input - jet expansion ε_s, nozzle blockage ε_n, collector blockage ε_c
 * @returns q_c / q_m (dimensionless)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` if the sum is ≤ −1
 * @example
 * openJetDynamicPressureRatio({ jetExpansion: -0.01, nozzleBlockage: 0.004, collectorBlockage: 0.002 }); // ≈ 0.992016
 */
export function openJetDynamicPressureRatio(input: OpenJetBlockageInput): number {
  const fn = 'openJetDynamicPressureRatio';
  const sum =
    requireFinite(fn, 'jet expansion', input.jetExpansion, '') +
    requireFinite(fn, 'nozzle blockage', input.nozzleBlockage, '') +
    requireFinite(fn, 'collector blockage', input.collectorBlockage, '');
  const factor = 1 + requireBlockage(fn, sum);
  return factor * factor;
}
