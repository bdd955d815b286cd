import { maskellDynamicPressureRatio, type MaskellInput } from './maskell-dynamic-pressure-ratio';

/**
 * Drag coefficient corrected for bluff-body blockage by Maskell's method.
 *
 * C_Dc = C_Du / (1 + θ · C_Du · S / C).
 *
 * Source: Maskell 1963, ARC R&M 3400; Barlow, Rae & Pope 1999, ch. 10.
 *
 * @param input - C_Du, reference area S (m²), section area C (m²), θ (default 2.5)
 * @returns corrected drag coefficient C_Dc (dimensionless)
 * @throws {AeroInputError} as {@link maskellDynamicPressureRatio}
 * @example
 * maskellCorrectedDragCoefficient({ uncorrectedDragCoefficient: 1.2, referenceArea: 0.2, sectionArea: 4 }); // ≈ 1.043478
 */
export function maskellCorrectedDragCoefficient(input: MaskellInput): number {
  return input.uncorrectedDragCoefficient / maskellDynamicPressureRatio(input);
}
