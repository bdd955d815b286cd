import { requireFinite, requirePositive } from '../errors/require-number';

/** Inputs of {@link horizontalBuoyancyDrag}. */
export interface HorizontalBuoyancyInput {
  /** Streamwise static-pressure gradient of the empty test section dp/dx, Pa/m (negative when pressure falls downstream). */
  readonly pressureGradient: number;
  /** Model volume V, m³. */
  readonly modelVolume: number;
}

/**
 * Horizontal-buoyancy drag: the drag that the empty-section pressure gradient adds to a model.
 *
 * ΔD_B = −(dp/dx)_empty · V. Subtract it from the measured drag.
 *
 * Source: Glauert 1933, ARC R&M 1566 (shape-factor refinements); Barlow, Rae & Pope 1999, ch. 10.
 *
 * @param input - empty-section gradient dp/dx (Pa/m) and model volume V (m³)
 * @returns buoyancy drag ΔD_B, N (positive means the gradient pushes the model downstream)
 * @throws {AeroInputError} `NOT_FINITE` for NaN or ±Infinity, `OUT_OF_RANGE` for V ≤ 0
 * @example
 * horizontalBuoyancyDrag({ pressureGradient: -5, modelVolume: 0.02 }); // 0.1 N
 */
export function horizontalBuoyancyDrag(input: HorizontalBuoyancyInput): number {
  const gradient = requireFinite('horizontalBuoyancyDrag', 'pressure gradient', input.pressureGradient, 'Pa/m');
  const volume = requirePositive('horizontalBuoyancyDrag', 'model volume', input.modelVolume, 'm³');
  // Written as 0 − g·V so that a zero gradient gives +0, not −0.
  return 0 - gradient * volume;
}
