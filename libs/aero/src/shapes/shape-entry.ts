/** Whether the library entry is a 2-D extruded section, a 3-D body, or a whole object tabulated by drag area. */
export type ShapeKind = '2-d' | '3-d' | 'object';

/** Names of the dimensions a shape entry asks for; all lengths in metres, areas in square metres. */
export type DimensionName = 'diameter' | 'length' | 'side' | 'width' | 'height' | 'frontalArea';

/** A part's dimensions, keyed by the names its shape entry lists. */
export type ShapeDimensions = Partial<Record<DimensionName, number>>;

/**
 * Drag coefficient of an entry: a tabulated number, or a named Reynolds-number curve evaluated by the planner
 * (`sphere` → `sphereDragMorrison`, `cylinder` → `cylinderDragWhite`, both in `reference-curves`).
 */
export type DragCoefficientSpec = number | { curve: 'sphere' | 'cylinder' };

/**
 * How an area is formed from a part's dimensions.
 * `frontal` is the area projected on a plane normal to the flow; `planform` is seen from above;
 * `face` is the area of one face as the source defines it, which may differ from the projected silhouette.
 */
export interface AreaRule {
  basis: 'frontal' | 'planform' | 'face';
  /** The rule in words, e.g. `length × diameter`. */
  formula: string;
  /** Dimensions the rule reads. */
  dimensions: readonly DimensionName[];
  /** Evaluates the rule, m²; callers check the dimensions first. */
  area: (dimensions: ShapeDimensions) => number;
}

/** The length a Reynolds number is formed on, and which dimension supplies it. */
export interface CharacteristicLength {
  dimension: DimensionName;
  description: string;
}

/** Reynolds-number range over which the tabulated value is stated to hold. `max: null` means no upper bound is given. */
export interface TabulatedReynoldsRange {
  min: number;
  max: number | null;
  /** Where the range comes from: quoted from the source, or widened by an argument stated here. */
  basis: string;
}

/** Published origin of an entry's value. */
export interface ShapeSource {
  /** Author, title, edition, table or figure, page if known. */
  citation: string;
  /** Secondary copies or compilations that the value was checked against. */
  corroboration?: string;
}

/** One library entry: a body or object the planner can build a test article from. */
export interface ShapeEntry {
  id: string;
  label: string;
  kind: ShapeKind;
  /** Groups orientations of the same body, e.g. `cube`; a part may name the family plus an orientation. */
  family: string;
  /** Orientation of the body to the flow, e.g. `flat-on`. */
  orientation: string;
  dragCoefficient: DragCoefficientSpec;
  /** Area the drag coefficient is based on. */
  referenceArea: AreaRule;
  /** Projected frontal area when it differs from the reference area (used for blockage); omitted when equal. */
  frontalArea?: AreaRule;
  /** Null for whole objects whose source states no Reynolds basis. */
  characteristicLength: CharacteristicLength | null;
  /** Null when the source states no range (whole objects) or when the curve's own range applies. */
  reynoldsRange: TabulatedReynoldsRange | null;
  /** Whether separation is fixed by sharp edges (drag largely Reynolds-independent) or free on rounded surfaces. */
  edges: 'sharp' | 'rounded';
  /** Typical frontal area the source gives for a whole object, m². */
  typicalFrontalArea?: number;
  source: ShapeSource;
  /** Whether the value was recalled without a copy of the source at hand. */
  fromMemory: boolean;
  /** Anything a user must know to apply the value. */
  note?: string;
}
