import { circleArea } from './circle-area';
import { rectangleArea } from './rectangle-area';
import type { AreaRule, TabulatedReynoldsRange, ShapeDimensions, ShapeEntry } from './shape-entry';
import {
  DATA_BOOK_STANDARD_SHAPES,
  MUNSON_2D_BODIES,
  MUNSON_3D_BODIES,
  MUNSON_OBJECTS,
  WICKERT_OBJECTS,
} from './shape-sources';

// Callers (`shapeReferenceArea`) check every listed dimension before a rule runs, so `?? NaN` never reaches a result.
const read = (dimensions: ShapeDimensions, name: keyof ShapeDimensions): number => dimensions[name] ?? Number.NaN;

const spanTimes = (height: 'diameter' | 'side' | 'height'): AreaRule => ({
  basis: 'frontal',
  formula: `length × ${height} (span length times frontal height, not a cross-section area)`,
  dimensions: ['length', height],
  area: (d) => rectangleArea(read(d, 'length'), read(d, height)),
});

const circleOfDiameter: AreaRule = {
  basis: 'frontal',
  formula: 'π × diameter² / 4',
  dimensions: ['diameter'],
  area: (d) => circleArea(read(d, 'diameter')),
};

const sideSquared: AreaRule = {
  basis: 'frontal',
  formula: 'side²',
  dimensions: ['side'],
  area: (d) => rectangleArea(read(d, 'side'), read(d, 'side')),
};

const measuredFrontalArea: AreaRule = {
  basis: 'frontal',
  formula: 'frontal area as measured or estimated for the object',
  dimensions: ['frontalArea'],
  area: (d) => read(d, 'frontalArea'),
};

// Sharp-edged bodies separate at their edges whatever the Reynolds number, so a value tabulated at one Re above
// about 1e4 is taken to hold at any Re ≥ 1e4 (from memory: the usual reading of these tables, not stated on them).
const sharpEdgedFrom = (tabulated: string): TabulatedReynoldsRange => ({
  min: 1e4,
  max: null,
  basis: `tabulated at ${tabulated}; separation fixed at sharp edges, so taken to hold for Re ≥ 1e4 (widening from memory)`,
});

const tabulatedAbove = (min: number, text: string): TabulatedReynoldsRange => ({ min, max: null, basis: `as tabulated: ${text}` });

/**
 * Bodies and objects the test planner can build an article from. Each value cites its source beside it;
 * `fromMemory` marks values recalled without a copy at hand.
 */
export const SHAPE_LIBRARY: readonly ShapeEntry[] = [
  // ── 2-D extruded sections: per unit span, C_D on span length × frontal height ──
  {
    id: 'circular-cylinder-cross-flow',
    label: 'Circular cylinder in cross-flow',
    kind: '2-d',
    family: 'circular-cylinder',
    orientation: 'cross-flow',
    dragCoefficient: { curve: 'cylinder' },
    referenceArea: spanTimes('diameter'),
    characteristicLength: { dimension: 'diameter', description: 'cylinder diameter' },
    reynoldsRange: null,
    edges: 'rounded',
    source: {
      citation:
        'F. M. White, Viscous Fluid Flow, McGraw-Hill: cylinder curve fit C_D = 1 + 10·Re^(−2/3), 1 ≤ Re ≤ 2e5, as implemented and cited by reference-curves/cylinderDragWhite (edition, equation number and range from memory there)',
    },
    fromMemory: true,
  },
  {
    id: 'square-section-flat-on',
    label: 'Square section, face normal to the flow',
    kind: '2-d',
    family: 'square-section',
    orientation: 'flat-on',
    dragCoefficient: 2.2, // Munson Fig. 9.19: square rod, R/D = 0 (sharp corners), C_D = 2.2 at Re = 1e5
    referenceArea: spanTimes('side'),
    characteristicLength: { dimension: 'side', description: 'side of the square (frontal height)' },
    reynoldsRange: sharpEdgedFrom('Re = 1e5'),
    edges: 'sharp',
    source: MUNSON_2D_BODIES,
    fromMemory: false,
  },
  {
    id: 'half-tube-concave-to-flow',
    label: 'Half-tube (semicircular shell), concave side facing the flow',
    kind: '2-d',
    family: 'half-tube',
    orientation: 'concave-to-flow',
    dragCoefficient: 2.3, // Munson Fig. 9.19: semicircular shell, C_D = 2.3 at Re = 2e4
    referenceArea: spanTimes('diameter'),
    characteristicLength: { dimension: 'diameter', description: 'shell diameter (frontal height)' },
    reynoldsRange: sharpEdgedFrom('Re = 2e4'),
    edges: 'sharp',
    source: {
      ...MUNSON_2D_BODIES,
      corroboration: 'Matthews, Aeronautical Engineer\'s Data Book, Fig. 5.13(b): hollow semi-cylinder, 2.30',
    },
    fromMemory: false,
  },
  {
    id: 'half-tube-convex-to-flow',
    label: 'Half-tube (semicircular shell), convex side facing the flow',
    kind: '2-d',
    family: 'half-tube',
    orientation: 'convex-to-flow',
    dragCoefficient: 1.1, // Munson Fig. 9.19: semicircular shell, C_D = 1.1 at Re = 2e4
    referenceArea: spanTimes('diameter'),
    characteristicLength: { dimension: 'diameter', description: 'shell diameter (frontal height)' },
    reynoldsRange: sharpEdgedFrom('Re = 2e4'),
    edges: 'sharp',
    source: {
      ...MUNSON_2D_BODIES,
      corroboration: 'Matthews, Aeronautical Engineer\'s Data Book, Fig. 5.13(b), lists 1.20 for the hollow semi-cylinder',
    },
    fromMemory: false,
  },
  {
    id: 'flat-plate-2d-normal',
    label: 'Long flat plate normal to the flow',
    kind: '2-d',
    family: 'flat-plate-2d',
    orientation: 'normal',
    dragCoefficient: 1.9, // Munson Fig. 9.19: rectangle with depth/height < 0.1, C_D = 1.9 at Re = 1e5
    referenceArea: spanTimes('height'),
    characteristicLength: { dimension: 'height', description: 'plate height across the flow' },
    reynoldsRange: sharpEdgedFrom('Re = 1e5'),
    edges: 'sharp',
    source: {
      ...MUNSON_2D_BODIES,
      corroboration: 'Matthews, Aeronautical Engineer\'s Data Book, Fig. 5.13(b): long flat plate at 90°, 1.98',
    },
    fromMemory: false,
    note: 'Valid while plate thickness in the flow direction is under a tenth of its height.',
  },
  // ── 3-D bodies ──
  {
    id: 'sphere',
    label: 'Sphere',
    kind: '3-d',
    family: 'sphere',
    orientation: 'any',
    dragCoefficient: { curve: 'sphere' },
    referenceArea: circleOfDiameter,
    characteristicLength: { dimension: 'diameter', description: 'sphere diameter' },
    reynoldsRange: null,
    edges: 'rounded',
    source: {
      citation:
        'F. A. Morrison, "Data Correlation for Drag Coefficient for Sphere", Michigan Technological University, 2013: correlation valid to Re = 1e6, as implemented and cited by reference-curves/sphereDragMorrison (title from memory there)',
    },
    fromMemory: false,
  },
  {
    id: 'disk-normal',
    label: 'Thin circular disk normal to the flow',
    kind: '3-d',
    family: 'disk',
    orientation: 'normal',
    dragCoefficient: 1.1, // Munson Fig. 9.20: thin disk, C_D = 1.1 for Re > 1e3
    referenceArea: circleOfDiameter,
    characteristicLength: { dimension: 'diameter', description: 'disk diameter' },
    reynoldsRange: tabulatedAbove(1e3, 'Re > 1e3'),
    edges: 'sharp',
    source: MUNSON_3D_BODIES,
    fromMemory: false,
  },
  {
    id: 'square-plate-normal',
    label: 'Square flat plate normal to the flow',
    kind: '3-d',
    family: 'square-plate',
    orientation: 'normal',
    dragCoefficient: 1.17, // Matthews Fig. 5.13(b): squared flat plate at 90°, C_D = 1.17
    referenceArea: sideSquared,
    characteristicLength: { dimension: 'side', description: 'plate side' },
    reynoldsRange: sharpEdgedFrom('no Re stated on the page'),
    edges: 'sharp',
    source: DATA_BOOK_STANDARD_SHAPES,
    fromMemory: false,
  },
  {
    id: 'cube-flat-on',
    label: 'Cube, face normal to the flow',
    kind: '3-d',
    family: 'cube',
    orientation: 'flat-on',
    dragCoefficient: 1.05, // Munson Fig. 9.20: cube, A = D², C_D = 1.05 for Re > 1e4
    referenceArea: sideSquared,
    characteristicLength: { dimension: 'side', description: 'cube side' },
    reynoldsRange: tabulatedAbove(1e4, 'Re > 1e4'),
    edges: 'sharp',
    source: MUNSON_3D_BODIES,
    fromMemory: false,
  },
  {
    id: 'cube-edge-on',
    label: 'Cube, edge facing the flow',
    kind: '3-d',
    family: 'cube',
    orientation: 'edge-on',
    dragCoefficient: 0.8, // Munson Fig. 9.20: cube edge-on, A = D², C_D = 0.80 for Re > 1e4
    referenceArea: {
      basis: 'face',
      formula: 'side² (one face, as the source defines A = D²; not the projected silhouette)',
      dimensions: ['side'],
      area: (d) => rectangleArea(read(d, 'side'), read(d, 'side')),
    },
    frontalArea: {
      basis: 'frontal',
      formula: '√2 × side² (silhouette seen across a face diagonal: √2·side wide, side high)',
      dimensions: ['side'],
      area: (d) => Math.SQRT2 * rectangleArea(read(d, 'side'), read(d, 'side')),
    },
    characteristicLength: { dimension: 'side', description: 'cube side' },
    reynoldsRange: tabulatedAbove(1e4, 'Re > 1e4'),
    edges: 'sharp',
    source: MUNSON_3D_BODIES,
    fromMemory: false,
  },
  {
    id: 'cone-60-apex-to-flow',
    label: 'Cone, 60° apex angle, apex facing the flow',
    kind: '3-d',
    family: 'cone-60',
    orientation: 'apex-to-flow',
    dragCoefficient: 0.51, // Matthews Fig. 5.13(b): cone α = 60°, C_D = 0.51 on πd²/4
    referenceArea: { ...circleOfDiameter, formula: 'π × base diameter² / 4' },
    characteristicLength: { dimension: 'diameter', description: 'base diameter' },
    reynoldsRange: sharpEdgedFrom('no Re stated on the page'),
    edges: 'sharp',
    source: {
      ...DATA_BOOK_STANDARD_SHAPES,
      corroboration:
        'F. M. White, Fluid Mechanics, 3-D body table: 60° cone, 0.5 (from memory); D. M. Bourg, Physics for Game Developers, Table 5-3: 60-degree cone, 0.5',
    },
    fromMemory: false,
    note: 'We read the page\'s α as the included apex angle; that reading agrees with the 0.5 other tables give for a 60° cone.',
  },
  {
    id: 'hollow-hemisphere-concave-to-flow',
    label: 'Hemispherical cup, open side facing the flow',
    kind: '3-d',
    family: 'hollow-hemisphere',
    orientation: 'concave-to-flow',
    dragCoefficient: 1.42, // Munson Fig. 9.20: hollow hemisphere, C_D = 1.42 for Re > 1e4
    referenceArea: circleOfDiameter,
    characteristicLength: { dimension: 'diameter', description: 'rim diameter' },
    reynoldsRange: tabulatedAbove(1e4, 'Re > 1e4'),
    edges: 'sharp',
    source: {
      ...MUNSON_3D_BODIES,
      corroboration: 'Matthews, Aeronautical Engineer\'s Data Book, Fig. 5.13(b): hollow semi-sphere, 1.42',
    },
    fromMemory: false,
  },
  {
    id: 'hollow-hemisphere-convex-to-flow',
    label: 'Hemispherical cup, convex side facing the flow',
    kind: '3-d',
    family: 'hollow-hemisphere',
    orientation: 'convex-to-flow',
    dragCoefficient: 0.38, // Munson Fig. 9.20: hollow hemisphere, C_D = 0.38 for Re > 1e4
    referenceArea: circleOfDiameter,
    characteristicLength: { dimension: 'diameter', description: 'rim diameter' },
    reynoldsRange: tabulatedAbove(1e4, 'Re > 1e4'),
    edges: 'sharp',
    source: {
      ...MUNSON_3D_BODIES,
      corroboration: 'Matthews, Aeronautical Engineer\'s Data Book, Fig. 5.13(b): hollow semi-sphere, 0.38',
    },
    fromMemory: false,
  },
  {
    id: 'solid-hemisphere-flat-to-flow',
    label: 'Solid hemisphere, flat face to the flow',
    kind: '3-d',
    family: 'solid-hemisphere',
    orientation: 'flat-to-flow',
    dragCoefficient: 1.17, // Munson Fig. 9.20: solid hemisphere, C_D = 1.17 for Re > 1e4
    referenceArea: circleOfDiameter,
    characteristicLength: { dimension: 'diameter', description: 'base diameter' },
    reynoldsRange: tabulatedAbove(1e4, 'Re > 1e4'),
    edges: 'sharp',
    source: MUNSON_3D_BODIES,
    fromMemory: false,
  },
  {
    id: 'solid-hemisphere-convex-to-flow',
    label: 'Solid hemisphere, curved face to the flow',
    kind: '3-d',
    family: 'solid-hemisphere',
    orientation: 'convex-to-flow',
    dragCoefficient: 0.42, // Munson Fig. 9.20: solid hemisphere, C_D = 0.42 for Re > 1e4
    referenceArea: circleOfDiameter,
    characteristicLength: { dimension: 'diameter', description: 'base diameter' },
    reynoldsRange: tabulatedAbove(1e4, 'Re > 1e4'),
    edges: 'sharp',
    source: MUNSON_3D_BODIES,
    fromMemory: false,
  },
  {
    id: 'streamlined-body',
    label: 'Streamlined body of revolution, nose to the flow',
    kind: '3-d',
    family: 'streamlined-body',
    orientation: 'nose-to-flow',
    dragCoefficient: 0.04, // Munson Fig. 9.20: streamlined body, A = πD²/4, C_D = 0.04 for Re > 1e5
    referenceArea: { ...circleOfDiameter, formula: 'π × maximum diameter² / 4' },
    characteristicLength: { dimension: 'diameter', description: 'maximum diameter' },
    reynoldsRange: tabulatedAbove(1e5, 'Re > 1e5'),
    edges: 'rounded',
    source: MUNSON_3D_BODIES,
    fromMemory: false,
  },
  // ── Whole objects: C_D on the object's frontal area, with the typical area the source gives ──
  {
    id: 'rider-upright',
    label: 'Rider on a bicycle, upright',
    kind: 'object',
    family: 'rider',
    orientation: 'upright',
    dragCoefficient: 1.1, // Wickert & Lewis Table 6.4: bicycle and rider (upright), C_D = 1.1, A = 0.53 m²
    referenceArea: measuredFrontalArea,
    characteristicLength: null,
    reynoldsRange: null,
    edges: 'rounded',
    typicalFrontalArea: 0.53, // Wickert & Lewis Table 6.4: 5.7 ft², 0.53 m²
    source: WICKERT_OBJECTS,
    fromMemory: false,
  },
  {
    id: 'rider-racing',
    label: 'Rider on a bicycle, racing crouch, leading',
    kind: 'object',
    family: 'rider',
    orientation: 'racing',
    dragCoefficient: 0.88, // Munson bicycle entries: racing, C_D = 0.88, A = 3.9 ft²
    referenceArea: measuredFrontalArea,
    characteristicLength: null,
    reynoldsRange: null,
    edges: 'rounded',
    typicalFrontalArea: 0.36, // 3.9 ft² = 0.362 m², given as 0.36 m² in the corroborating compilation
    source: MUNSON_OBJECTS,
    fromMemory: false,
    note: 'Wickert & Lewis Table 6.4 lists a racing rider at C_D = 0.9 on 0.37 m², consistent with this entry.',
  },
  {
    id: 'rider-drafting',
    label: 'Rider on a bicycle, racing crouch, drafting close behind another',
    kind: 'object',
    family: 'rider',
    orientation: 'drafting',
    dragCoefficient: 0.5, // Munson bicycle entries: drafting, C_D = 0.50, A = 3.9 ft²
    referenceArea: measuredFrontalArea,
    characteristicLength: null,
    reynoldsRange: null,
    edges: 'rounded',
    typicalFrontalArea: 0.36, // 3.9 ft² = 0.362 m²
    source: MUNSON_OBJECTS,
    fromMemory: false,
  },
  {
    id: 'rider-streamlined',
    label: 'Rider in a streamlined enclosure',
    kind: 'object',
    family: 'rider',
    orientation: 'streamlined',
    dragCoefficient: 0.12, // Munson bicycle entries: streamlined, C_D = 0.12, A = 5.0 ft²
    referenceArea: measuredFrontalArea,
    characteristicLength: null,
    reynoldsRange: null,
    edges: 'rounded',
    typicalFrontalArea: 0.47, // 5.0 ft² = 0.465 m², given as 0.47 m² in the corroborating compilation
    source: MUNSON_OBJECTS,
    fromMemory: false,
  },
  {
    id: 'person-standing',
    label: 'Person standing',
    kind: 'object',
    family: 'person',
    orientation: 'standing',
    dragCoefficient: 1.2, // Wickert & Lewis Table 6.4: person (standing), C_D = 1.2, A = 0.62 m²
    referenceArea: measuredFrontalArea,
    characteristicLength: null,
    reynoldsRange: null,
    edges: 'rounded',
    typicalFrontalArea: 0.62, // Wickert & Lewis Table 6.4: 6.7 ft², 0.62 m²
    source: WICKERT_OBJECTS,
    fromMemory: false,
  },
];
