import { requirePositive } from '../errors/require-number';

/** Thom's body-shape factor K for a wing, short form (Barlow, Rae & Pope 1999, ch. 10 — from memory). */
export const THOM_K_WING = 0.9;
/** Thom's body-shape factor K for a body of revolution, short form (Barlow, Rae & Pope 1999, ch. 10 — from memory). */
export const THOM_K_BODY = 0.96;

/** Inputs of {@link thomSolidBlockage}. */
export interface ThomSolidBlockageInput {
  /** Body-shape factor K (dimensionless), e.g. {@link THOM_K_WING} or {@link THOM_K_BODY}, or K1/K3 read from the charts. */
  readonly bodyShapeFactor: number;
  /** Tunnel-shape factor τ1 (dimensionless), read from the chart for the test-section shape and model span. */
  readonly tunnelShapeFactor: number;
  /** Model volume V, m³. */
  readonly modelVolume: number;
  /** Test-section cross-section area C, m². */
  readonly sectionArea: number;
}

/**
 * Solid blockage of a model in a closed test section, Thom/Herriot form.
 *
 * ε_sb = K · τ1 · V / C^(3/2).
 *
 * Source: Barlow, Rae & Pope 1999, Low-Speed Wind Tunnel Testing, 3rd ed., ch. 10 (equation number from memory).
 *
 * @param input - body-shape factor K, tunnel-shape factor τ1, model volume V (m³), section area C (m²)
 * @returns solid-blockage factor ε_sb (dimensionless velocity increment)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for any input ≤ 0
 * @example
 * thomSolidBlockage({ bodyShapeFactor: 0.96, tunnelShapeFactor: 0.86, modelVolume: 0.02, sectionArea: 2 }); // ≈ 0.0058378
 */
export function thomSolidBlockage(input: ThomSolidBlockageInput): number {
  const fn = 'thomSolidBlockage';
  const k = requirePositive(fn, 'body-shape factor', input.bodyShapeFactor, '');
  const tau = requirePositive(fn, 'tunnel-shape factor', input.tunnelShapeFactor, '');
  const volume = requirePositive(fn, 'model volume', input.modelVolume, 'm³');
  const area = requirePositive(fn, 'test-section area', input.sectionArea, 'm²');
  return (k * tau * volume) / area ** 1.5;
}
