/** Stable codes of the warnings a build-up can carry. */
export type PlannerWarningCode = 'RE_BELOW_RANGE' | 'RE_ABOVE_RANGE' | 'RE_RANGE_NOT_STATED';

/** A warning on one part: stable code plus text. */
export interface PlannerWarning {
  code: PlannerWarningCode;
  message: string;
}

/** One part of a build-up, with the numbers that produced its drag. */
export interface PartDrag {
  label: string;
  /** Library entry id; null for a custom part. */
  shapeId: string | null;
  count: number;
  /** Reference area of one item, m²; null for a custom part. */
  referenceArea: number | null;
  /** The reference-area rule in words; null for a custom part. */
  referenceAreaRule: string | null;
  /** Projected frontal area of all items, m²; null when unknown. */
  frontalArea: number | null;
  /** Characteristic length, m; null when the part has none. */
  characteristicLength: number | null;
  reynoldsNumber: number | null;
  /** Whether separation is fixed at sharp edges or free on rounded surfaces; null for a custom part. */
  edges: 'sharp' | 'rounded' | null;
  /** C_D used; null for a custom part (its drag area is given). */
  dragCoefficient: number | null;
  /** C_D·A of all items, m². */
  dragArea: number;
  /** Drag of all items in isolation, q·C_D·A, N (before the interference factor). */
  drag: number;
  /** Fraction of the summed drag area, 0…1. */
  dragShare: number;
  warnings: PlannerWarning[];
}

/** Result of {@link buildUpDrag}. */
export interface BuildUpResult {
  parts: PartDrag[];
  speed: number;
  density: number;
  viscosity: number;
  /** q = ½ρV², Pa. */
  dynamicPressure: number;
  interferenceFactor: number;
  /** Σ C_D,i·A_i, m². */
  sumDragArea: number;
  /** Σ C_D,i·A_i × interference factor, m². */
  totalDragArea: number;
  /** q × Σ C_D,i·A_i × interference factor, N. */
  totalDrag: number;
  assumptions: string[];
  caution: string;
}
