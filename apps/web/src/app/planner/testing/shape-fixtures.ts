import type { ShapeInfo } from '@tunnelwright/contracts';

type ShapeFields = Pick<ShapeInfo, 'id' | 'label' | 'kind' | 'family' | 'orientation' | 'dragCoefficient' | 'referenceArea' | 'characteristicLength' | 'source'>;

/**
 * A library shape for planner specs: the given fields, with rounded edges, no fixed frontal area, Reynolds range,
 * typical area or note, and not from memory unless `rest` says otherwise.
 */
export function shapeFixture(fields: ShapeFields, rest: Partial<ShapeInfo> = {}): ShapeInfo {
  return { frontalArea: null, reynoldsRange: null, edges: 'rounded', typicalFrontalArea: null, fromMemory: false, note: null, ...fields, ...rest };
}

/** A sphere on the sphere drag curve, its area π × diameter² / 4, citing `citation` (invented in every spec). */
export function sphereFixture(citation: string): ShapeInfo {
  return shapeFixture({
    id: 'sphere',
    label: 'Sphere',
    kind: '3-d',
    family: 'sphere',
    orientation: 'any',
    dragCoefficient: { curve: 'sphere' },
    referenceArea: { basis: 'frontal', formula: 'π × diameter² / 4', dimensions: ['diameter'] },
    characteristicLength: { dimension: 'diameter', description: 'sphere diameter' },
    source: { citation, corroboration: null },
  });
}
