import { CYLINDER_DRAG_WHITE_RANGE, cylinderDragWhite, SPHERE_DRAG_MORRISON_RANGE, sphereDragMorrison } from '../reference-curves';
import { AeroInputError } from '../errors';
import { requirePositive } from '../errors/require-number';
import type { ShapeEntry } from '../shapes';
import type { PlannerWarning } from './build-up-result';

/** Drag coefficient of a library entry at one Reynolds number, with any range warnings. */
export interface PartDragCoefficient {
  dragCoefficient: number;
  warnings: PlannerWarning[];
}

interface RangeLimits {
  min: number;
  max: number | null;
  basis: string;
}

const CURVES = {
  sphere: { evaluate: sphereDragMorrison, range: SPHERE_DRAG_MORRISON_RANGE, name: 'sphereDragMorrison' },
  cylinder: { evaluate: cylinderDragWhite, range: CYLINDER_DRAG_WHITE_RANGE, name: 'cylinderDragWhite' },
} as const;

const formatRe = (re: number): string => re.toExponential(2);

function rangeWarnings(entry: ShapeEntry, re: number | null, limits: RangeLimits | null): PlannerWarning[] {
  if (re === null || limits === null) {
    return [
      {
        code: 'RE_RANGE_NOT_STATED',
        message: `${entry.label}: the source states no Reynolds-number range; C_D ${entry.dragCoefficient.toString()} is applied as tabulated.`,
      },
    ];
  }
  if (re < limits.min) {
    return [
      {
        code: 'RE_BELOW_RANGE',
        message: `${entry.label}: Re = ${formatRe(re)} is below ${formatRe(limits.min)} (${limits.basis}); C_D is extrapolated.`,
      },
    ];
  }
  if (limits.max !== null && re > limits.max) {
    return [
      {
        code: 'RE_ABOVE_RANGE',
        message: `${entry.label}: Re = ${formatRe(re)} is above ${formatRe(limits.max)} (${limits.basis}); C_D is extrapolated.`,
      },
    ];
  }
  return [];
}

/**
 * Drag coefficient of a library entry: the tabulated number, or the entry's Reynolds-number curve
 * (`sphereDragMorrison` or `cylinderDragWhite`) evaluated at `re`, clamped to the curve's range ends when outside it.
 * Warns when `re` lies outside the range the source states.
 *
 * Source: the entry's own source; curves as cited in `reference-curves`.
 *
 * @param entry library entry
 * @param re Reynolds number on the entry's characteristic length; null when the entry has none
 * @returns C_D (dimensionless) and warnings
 * @throws {AeroInputError} `OUT_OF_RANGE` when a curve entry has no Reynolds number; `NOT_FINITE` or `OUT_OF_RANGE`
 *   when `re` is not finite and positive
 * @example partDragCoefficient(findShape('cube-flat-on'), 1e5).dragCoefficient // 1.05
 */
export function partDragCoefficient(entry: ShapeEntry, re: number | null): PartDragCoefficient {
  if (re !== null) requirePositive('partDragCoefficient', 'Reynolds number', re, '');
  const spec = entry.dragCoefficient;
  if (typeof spec === 'number') {
    return { dragCoefficient: spec, warnings: rangeWarnings(entry, re, entry.reynoldsRange) };
  }
  if (re === null) {
    throw new AeroInputError('OUT_OF_RANGE', `\`partDragCoefficient\` requires a Reynolds number for the ${spec.curve} curve of '${entry.id}'`);
  }
  const curve = CURVES[spec.curve];
  const limits: RangeLimits = { min: curve.range.min, max: curve.range.max, basis: `range of ${curve.name}` };
  // Outside its fitted range a curve is held at its end value rather than extrapolated, and the part is flagged.
  const clamped = Math.min(Math.max(re, limits.min), limits.max ?? re);
  return { dragCoefficient: curve.evaluate(clamped), warnings: rangeWarnings(entry, re, limits) };
}
