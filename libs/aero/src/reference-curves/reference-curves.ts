import { CYLINDER_DRAG_WHITE_RANGE, cylinderDragWhite } from './cylinder-drag-white';
import type { ReynoldsRange } from './reynolds-range';
import { SPHERE_DRAG_CLIFT_GAUVIN_RANGE, sphereDragCliftGauvin } from './sphere-drag-clift-gauvin';
import { SPHERE_DRAG_MORRISON_RANGE, sphereDragMorrison } from './sphere-drag-morrison';
import { SPHERE_DRAG_MORRISON_BOOK_RANGE, sphereDragMorrisonBook } from './sphere-drag-morrison-book';
import { SPHERE_DRAG_WHITE_RANGE, sphereDragWhite } from './sphere-drag-white';

/** Identifiers of the reference drag curves. */
export type ReferenceCurveId = 'sphere-morrison' | 'sphere-morrison-book' | 'sphere-clift-gauvin' | 'sphere-white' | 'cylinder-white';

/** One published drag curve that measured data can be plotted against. */
export interface ReferenceCurve {
  readonly id: ReferenceCurveId;
  /** Short label for a chart legend. */
  readonly label: string;
  /** The body the curve describes. */
  readonly body: 'sphere' | 'cylinder';
  /** Published source of the curve. */
  readonly source: string;
  /** Reynolds-number range over which the source states the curve valid. */
  readonly validRange: ReynoldsRange;
  /** C_D as a function of Re (dimensionless → dimensionless). */
  readonly fn: (reynoldsNumber: number) => number;
}

/** The reference drag curves for smooth spheres and cylinders, in the order a chart legend lists them. */
export const referenceCurves: readonly ReferenceCurve[] = Object.freeze([
  {
    id: 'sphere-morrison',
    label: 'Sphere, Morrison 2013 correlation',
    body: 'sphere',
    source: 'Morrison 2013, Data Correlation for Drag Coefficient for Sphere, Michigan Technological University',
    validRange: SPHERE_DRAG_MORRISON_RANGE,
    fn: sphereDragMorrison,
  },
  {
    id: 'sphere-morrison-book',
    label: 'Sphere, Morrison 2013 textbook fit',
    body: 'sphere',
    source: 'Morrison 2013, An Introduction to Fluid Mechanics, Cambridge University Press',
    validRange: SPHERE_DRAG_MORRISON_BOOK_RANGE,
    fn: sphereDragMorrisonBook,
  },
  {
    id: 'sphere-clift-gauvin',
    label: 'Sphere, Clift–Gauvin',
    body: 'sphere',
    source: "Clift & Gauvin 1970, Proc. Chemeca '70; Clift, Grace & Weber 1978, Bubbles, Drops and Particles",
    validRange: SPHERE_DRAG_CLIFT_GAUVIN_RANGE,
    fn: sphereDragCliftGauvin,
  },
  {
    id: 'sphere-white',
    label: 'Sphere, White fit',
    body: 'sphere',
    source: 'White, Viscous Fluid Flow, McGraw-Hill',
    validRange: SPHERE_DRAG_WHITE_RANGE,
    fn: sphereDragWhite,
  },
  {
    id: 'cylinder-white',
    label: 'Cylinder, White fit',
    body: 'cylinder',
    source: 'White, Viscous Fluid Flow, McGraw-Hill',
    validRange: CYLINDER_DRAG_WHITE_RANGE,
    fn: cylinderDragWhite,
  },
] satisfies ReferenceCurve[]);
