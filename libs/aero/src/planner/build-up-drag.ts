import { AeroInputError } from '../errors';
import { requirePositive } from '../errors/require-number';
import { dynamicPressure, reynoldsNumber } from '../flow';
import { findShape, shapeArea, type ShapeDimensions, type ShapeEntry } from '../shapes';
import type { BuildUpResult, PartDrag } from './build-up-result';
import { partDragCoefficient } from './part-drag-coefficient';
import { PLANNER_CAUTION } from './planner-caution';
import { isCustomPart, type CustomPart, type PlannerPart, type ShapePart } from './planner-part';

/** Flow conditions of a build-up. */
export interface BuildUpConditions {
  /** Air speed relative to the article, m/s. */
  speed: number;
  /** Air density, kg/m³. */
  density: number;
  /** Dynamic viscosity, Pa·s. */
  viscosity: number;
  /** Multiplier on the summed drag areas for the interference between parts; 1 when omitted. */
  interferenceFactor?: number;
}

type UnsharedPart = Omit<PartDrag, 'dragShare'>;

const FN = 'buildUpDrag';

function requireCount(label: string, count: number): void {
  requirePositive(FN, `count of '${label}'`, count, '');
  if (!Number.isInteger(count)) {
    throw new AeroInputError('OUT_OF_RANGE', `\`${FN}\` requires a whole-number count of '${label}'; got ${count}`);
  }
}

function withObjectDefaults(entry: ShapeEntry, dimensions: ShapeDimensions): ShapeDimensions {
  if (entry.kind === 'object' && dimensions.frontalArea === undefined && entry.typicalFrontalArea !== undefined) {
    return { ...dimensions, frontalArea: entry.typicalFrontalArea };
  }
  return dimensions;
}

function customPartDrag(part: CustomPart, q: number): UnsharedPart {
  const count = part.count ?? 1;
  requireCount(part.label, count);
  requirePositive(FN, `drag area of '${part.label}'`, part.dragArea, 'm²');
  if (part.frontalArea !== undefined) requirePositive(FN, `frontal area of '${part.label}'`, part.frontalArea, 'm²');
  const dragArea = part.dragArea * count;
  return {
    label: part.label,
    shapeId: null,
    count,
    referenceArea: null,
    referenceAreaRule: null,
    frontalArea: part.frontalArea === undefined ? null : part.frontalArea * count,
    characteristicLength: null,
    reynoldsNumber: null,
    edges: null,
    dragCoefficient: null,
    dragArea,
    drag: q * dragArea,
    warnings: [],
  };
}

function shapePartDrag(part: ShapePart, conditions: BuildUpConditions, q: number): UnsharedPart {
  const entry = findShape(part.shapeId, part.orientation);
  const label = part.label ?? entry.label;
  requireCount(label, part.count);
  const dimensions = withObjectDefaults(entry, part.dimensions);
  const referenceArea = shapeArea(entry.referenceArea, dimensions);
  const frontalRule = entry.frontalArea ?? entry.referenceArea;
  const length = entry.characteristicLength ? (dimensions[entry.characteristicLength.dimension] ?? Number.NaN) : null;
  if (length !== null) requirePositive(FN, `${entry.characteristicLength?.dimension} of '${label}'`, length, 'm');
  const re = length === null ? null : reynoldsNumber(conditions.density, conditions.speed, length, conditions.viscosity);
  const { dragCoefficient, warnings } = partDragCoefficient(entry, re);
  const dragArea = dragCoefficient * referenceArea * part.count;
  return {
    label,
    shapeId: entry.id,
    count: part.count,
    referenceArea,
    referenceAreaRule: entry.referenceArea.formula,
    frontalArea: shapeArea(frontalRule, dimensions) * part.count,
    characteristicLength: length,
    reynoldsNumber: re,
    edges: entry.edges,
    dragCoefficient,
    dragArea,
    drag: q * dragArea,
    warnings,
  };
}

/**
 * Drag build-up of a test article from its parts: each part's reference area by its entry's rule, its Reynolds
 * number on its own characteristic length, its C_D, C_D·A and isolated drag; the total is
 * D = q · Σ C_D,i·A_i × interference factor, with q = ½ρV².
 *
 * Source: component drag build-up (sum of isolated-part drag areas times an interference allowance),
 * common practice; C_D values from the shape library's cited sources.
 *
 * @param parts library-shape parts and custom parts with known C_D·A
 * @param conditions speed (m/s), density (kg/m³), viscosity (Pa·s), interference factor (dimensionless, default 1)
 * @returns per-part and total drag, drag areas, stated assumptions and the planner caution
 * @throws {AeroInputError} `EMPTY_INPUT` when there are no parts; `NOT_FINITE` or `OUT_OF_RANGE` when a condition or
 *   dimension is not finite and positive or a count is not a positive whole number; `UNKNOWN_ID` for an unknown shape
 * @example buildUpDrag([{ shapeId: 'sphere', dimensions: { diameter: 0.2 }, count: 1 }], { speed: 20, density: 1.225, viscosity: 1.7894e-5 }).totalDrag // ≈ 1.81 N (Re ≈ 2.74e5, C_D ≈ 0.236)
 */
export function buildUpDrag(parts: readonly PlannerPart[], conditions: BuildUpConditions): BuildUpResult {
  if (parts.length === 0) throw new AeroInputError('EMPTY_INPUT', `\`${FN}\` requires at least one part`);
  const interferenceFactor = conditions.interferenceFactor ?? 1;
  requirePositive(FN, 'speed', conditions.speed, 'm/s');
  requirePositive(FN, 'density', conditions.density, 'kg/m³');
  requirePositive(FN, 'viscosity', conditions.viscosity, 'Pa·s');
  requirePositive(FN, 'interference factor', interferenceFactor, '');
  const q = dynamicPressure(conditions.density, conditions.speed);
  const unshared = parts.map((part) => (isCustomPart(part) ? customPartDrag(part, q) : shapePartDrag(part, conditions, q)));
  const sumDragArea = unshared.reduce((sum, part) => sum + part.dragArea, 0);
  const totalDragArea = sumDragArea * interferenceFactor;
  return {
    parts: unshared.map((part) => ({ ...part, dragShare: part.dragArea / sumDragArea })),
    speed: conditions.speed,
    density: conditions.density,
    viscosity: conditions.viscosity,
    dynamicPressure: q,
    interferenceFactor,
    sumDragArea,
    totalDragArea,
    totalDrag: q * totalDragArea,
    assumptions: [
      `Total drag is q × Σ C_D·A × ${interferenceFactor}: parts are taken in isolation and their mutual interference is covered by this single factor.`,
      'Part drag and drag share are isolated values, before the interference factor.',
      'Tabulated C_D values are for the stated Reynolds ranges, smooth surfaces and low free-stream turbulence.',
    ],
    caution: PLANNER_CAUTION,
  };
}
