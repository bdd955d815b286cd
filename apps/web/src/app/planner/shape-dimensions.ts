import type { PlanShapeDimensions, ShapeInfo } from '@tunnelwright/contracts';

/** Every dimension a part may carry, in the order the parts table shows them. */
export const dimensionNames = ['diameter', 'length', 'side', 'width', 'height', 'frontalArea'] as const satisfies readonly (keyof PlanShapeDimensions)[];
export type DimensionName = (typeof dimensionNames)[number];

/** Field labels with their units. */
export const dimensionLabels: Readonly<Record<DimensionName, string>> = {
  diameter: 'Diameter (m)',
  length: 'Length (m)',
  side: 'Side (m)',
  width: 'Width (m)',
  height: 'Height (m)',
  frontalArea: 'Frontal area (m²)',
};

/** Group headings of the shape picker. */
export const shapeKindLabels: Readonly<Record<ShapeInfo['kind'], string>> = {
  '2-d': '2-D sections (per span)',
  '3-d': '3-D bodies',
  object: 'Whole objects',
};

/**
 * The dimensions a shape reads: its reference-area rule, its frontal-area rule and its Reynolds length.
 * A whole object with a typical frontal area may leave its area empty.
 */
export function requiredDimensions(shape: ShapeInfo): DimensionName[] {
  const names = new Set<DimensionName>(shape.referenceArea.dimensions);
  for (const name of shape.frontalArea?.dimensions ?? []) names.add(name);
  if (shape.characteristicLength) names.add(shape.characteristicLength.dimension);
  if (shape.kind === 'object' && shape.typicalFrontalArea !== null) names.delete('frontalArea');
  return dimensionNames.filter((name) => names.has(name));
}

/** The dimensions shown for a shape: the required ones, plus an optional area for objects with a typical one. */
export function shownDimensions(shape: ShapeInfo): DimensionName[] {
  const shown = requiredDimensions(shape);
  if (shape.kind === 'object' && !shown.includes('frontalArea')) shown.push('frontalArea');
  return shown;
}
