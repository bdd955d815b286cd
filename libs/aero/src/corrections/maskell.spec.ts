import { describe, expect, it } from 'vitest';
import { AeroInputError } from '../errors/aero-input-error';
import { maskellCorrectedDragCoefficient } from './maskell-corrected-drag-coefficient';
import { MASKELL_THETA, maskellDynamicPressureRatio } from './maskell-dynamic-pressure-ratio';

// S/C = 0.05 as in the check case: S 0.2 m² in a 4 m² section.
const CASE = { uncorrectedDragCoefficient: 1.2, referenceArea: 0.2, sectionArea: 4 };

describe('Maskell bluff-body blockage', () => {
  it('gives q_c/q_u 1.15 and C_Dc 1.043478 for θ 2.5, C_Du 1.2, S/C 0.05', () => {
    // Maskell 1963, ARC R&M 3400: 1 + 2.5 × 1.2 × 0.05 = 1.15 and 1.2/1.15 = 1.043478, ±1e-6 relative.
    expect(Math.abs(maskellDynamicPressureRatio(CASE) / 1.15 - 1)).toBeLessThan(1e-12);
    expect(Math.abs(maskellCorrectedDragCoefficient(CASE) / 1.043478 - 1)).toBeLessThan(1e-6);
  });

  it('uses θ = 5/2, not Thom’s K', () => {
    // Maskell 1963, ARC R&M 3400: θ ≈ 5/2 in three dimensions.
    expect(MASKELL_THETA).toBe(2.5);
    expect(maskellDynamicPressureRatio({ ...CASE, theta: 2.5 })).toBe(maskellDynamicPressureRatio(CASE));
  });

  it('gives a ratio of one for zero drag', () => {
    expect(maskellDynamicPressureRatio({ ...CASE, uncorrectedDragCoefficient: 0 })).toBe(1);
  });

  it('rejects NaN, infinity, zero areas and zero θ', () => {
    expect(() => maskellDynamicPressureRatio({ ...CASE, uncorrectedDragCoefficient: Number.NaN })).toThrow(AeroInputError);
    expect(() => maskellDynamicPressureRatio({ ...CASE, sectionArea: Number.POSITIVE_INFINITY })).toThrow(/finite test-section area/);
    expect(() => maskellDynamicPressureRatio({ ...CASE, referenceArea: 0 })).toThrow(/positive reference area/);
    expect(() => maskellCorrectedDragCoefficient({ ...CASE, theta: 0 })).toThrow(/`maskellDynamicPressureRatio` requires a positive theta/);
  });
});
