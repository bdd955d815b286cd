import type { ShapeDimensions } from '../shapes';

/** A part built from a library shape: `count` identical items of the given dimensions. */
export interface ShapePart {
  /** Library entry id, or a family name together with `orientation`. */
  shapeId: string;
  /** Dimensions the entry asks for, m (`frontalArea` in m²; objects default to the entry's typical area). */
  dimensions: ShapeDimensions;
  /** Number of identical items, a positive integer. */
  count: number;
  /** Orientation within the shape family, e.g. `edge-on`. */
  orientation?: string;
  /** Name shown in results; the entry's label when omitted. */
  label?: string;
}

/** A part whose drag area is already known (from an earlier test or a supplier), per item. */
export interface CustomPart {
  label: string;
  /** C_D·A per item, m². */
  dragArea: number;
  /** Number of identical items, a positive integer; 1 when omitted. */
  count?: number;
  /** Projected frontal area per item, m², used for blockage; blockage is flagged when missing. */
  frontalArea?: number;
}

/** One line of a drag build-up. */
export type PlannerPart = ShapePart | CustomPart;

/** Whether a part is a custom part with a known drag area. */
export function isCustomPart(part: PlannerPart): part is CustomPart {
  return 'dragArea' in part;
}
