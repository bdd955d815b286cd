import { requireFinite, requirePositive } from '../errors/require-number';

/**
 * Full-scale drag area of a geometrically similar article from its model-scale value: C_D·A_full = C_D·S_model · s²,
 * with s the full-scale to model length ratio (4 for a 1:4 model). The drag coefficient is taken as the same at both
 * scales, so Reynolds-number effects are not included; an expanded uncertainty scales by the same factor.
 *
 * Source: areas of similar figures go as the square of the length ratio (definition); the same rule as the reduction
 * engine's full-scale drag area (`addFullScale`, Barlow, Rae & Pope 1999 ch. 1, from memory).
 *
 * @param modelDragArea model C_D·S, m² (or its U, which may be zero)
 * @param scale full-scale to model length ratio, dimensionless
 * @returns full-scale C_D·A, m²
 * @throws {AeroInputError} `NOT_FINITE` or `OUT_OF_RANGE` for a non-finite or negative area, or a scale that is not positive
 * @example fullScaleDragArea(0.04, 4) // 0.64
 */
export function fullScaleDragArea(modelDragArea: number, scale: number): number {
  const area = requireFinite('fullScaleDragArea', 'model drag area', modelDragArea, 'm²');
  if (area < 0) requirePositive('fullScaleDragArea', 'model drag area', area, 'm²');
  const s = requirePositive('fullScaleDragArea', 'scale', scale, '');
  return area * s * s;
}
