import { z } from 'zod';

/**
 * Test planner: a drag build-up of the full-scale article from library shapes and known drag areas, checked
 * against a tunnel at a model scale, with full-scale power in wind and an estimate of tunnel hours.
 * Every quantity is SI: m, m², m/s, N, W, kg/m³, Pa·s; wind direction in degrees (0 = headwind, 180 = tailwind).
 */

/** ISA sea-level air, the defaults of a plan (the same values as `ISA_SEA_LEVEL` in the numerics library). */
export const PLANNER_DEFAULT_AIR = Object.freeze({ density: 1.225, viscosity: 1.7894e-5 });

const positive = (what: string) =>
  z.number({ message: `${what} must be a number` }).positive({ message: `${what} must be greater than zero` }).finite();
const nonNegative = (what: string) =>
  z.number({ message: `${what} must be a number` }).min(0, { message: `${what} cannot be negative` }).finite();
const wholeCount = (what: string) =>
  z.number({ message: `${what} must be a number` }).int({ message: `${what} must be a whole number` });

/** The dimensions a library shape may ask for: lengths in m, `frontalArea` in m². */
export const shapeDimensionsSchema = z.object({
  diameter: positive('Diameter').optional(),
  length: positive('Length').optional(),
  side: positive('Side').optional(),
  width: positive('Width').optional(),
  height: positive('Height').optional(),
  frontalArea: positive('Frontal area').optional(),
});
export type PlanShapeDimensions = z.infer<typeof shapeDimensionsSchema>;

/** A part built from a library shape: `count` identical items. */
export const shapePlanPartSchema = z.object({
  type: z.literal('shape'),
  shapeId: z.string().trim().min(1, { message: 'Choose a shape' }).max(80),
  /** Orientation within the shape family, when `shapeId` names a family rather than an entry. */
  orientation: z.string().trim().max(80).optional(),
  dimensions: shapeDimensionsSchema,
  count: wholeCount('Count').min(1, { message: 'Count must be at least 1' }).max(10_000),
  label: z.string().trim().max(120).optional(),
});

/** A part whose drag area per item is already known, e.g. from an earlier test. */
export const customPlanPartSchema = z.object({
  type: z.literal('custom'),
  label: z.string().trim().min(1, { message: 'Name the part' }).max(120),
  /** C_D·A per item, m². */
  dragArea: positive('Drag area'),
  count: wholeCount('Count').min(1, { message: 'Count must be at least 1' }).max(10_000).default(1),
  /** Projected frontal area per item, m²; blockage is flagged as incomplete without it. */
  frontalArea: positive('Frontal area').optional(),
});

export const planPartSchema = z.discriminatedUnion('type', [shapePlanPartSchema, customPlanPartSchema], {
  message: 'A part is either a library shape or a custom part',
});
export type PlanPart = z.infer<typeof planPartSchema>;
export type ShapePlanPart = z.infer<typeof shapePlanPartSchema>;
export type CustomPlanPart = z.infer<typeof customPlanPartSchema>;

/** Everything the planner needs to evaluate a test; stored as one plan version. */
export const planInputSchema = z.object({
  parts: z.array(planPartSchema).min(1, { message: 'Add at least one part' }).max(50, { message: 'A plan has at most 50 parts' }),
  /** Planned tunnel speeds, m/s. */
  speeds: z.array(positive('Speed')).min(1, { message: 'Plan at least one speed' }).max(20, { message: 'Plan at most 20 speeds' }),
  /** Air in the tunnel and at full scale; ISA sea level when omitted. */
  air: z
    .object({
      density: positive('Density').default(PLANNER_DEFAULT_AIR.density),
      viscosity: positive('Viscosity').default(PLANNER_DEFAULT_AIR.viscosity),
    })
    .default({ ...PLANNER_DEFAULT_AIR }),
  /** Multiplier on the summed drag areas for interference between parts, dimensionless. */
  interferenceFactor: positive('Interference factor').max(3, { message: 'Interference factor must be at most 3' }).default(1),
  tunnelId: z.uuid({ message: 'Choose a tunnel' }),
  /**
   * Balance drag capacity, N. Tunnels in the catalogue carry no balance, so the capacity comes from here or from
   * `balanceId` (that balance's Fx capacity); one of the two is required.
   */
  dragCapacity: positive('Drag capacity').optional(),
  balanceId: z.uuid({ message: 'Choose a balance' }).optional(),
  /** Length scale λ = model / full scale, dimensionless. */
  scale: positive('Scale').max(10, { message: 'Scale must be at most 10' }),
  /** Allowance on predicted loads for yawed attitudes, fraction (0.25 = +25 %). */
  yawMargin: nonNegative('Yaw margin').max(2, { message: 'Yaw margin must be at most 2 (200 %)' }).default(0.25),
  /** Full scale: the build-up is evaluated at the ground speed in still air; power adds the wind. */
  fullScale: z.object({
    groundSpeed: positive('Ground speed').max(400, { message: 'Ground speed must be at most 400 m/s' }),
    windSpeed: nonNegative('Wind speed').max(100, { message: 'Wind speed must be at most 100 m/s' }).default(0),
    /** 0 = headwind, 180 = tailwind, degrees. */
    windDirection: nonNegative('Wind direction').max(360, { message: 'Wind direction must be at most 360°' }).default(0),
    /** Highest wind speed of the head- versus tail-wind chart, m/s. */
    seriesMaxWind: positive('Chart wind range').max(100, { message: 'Chart wind range must be at most 100 m/s' }).default(10),
  }),
  /** Tunnel occupancy inputs: the lab's own figures. */
  duration: z
    .object({
      points: wholeCount('Test points').min(0, { message: 'Test points cannot be negative' }).max(100_000).default(60),
      dwellSeconds: nonNegative('Dwell per point').max(3600).default(30),
      configurationChanges: wholeCount('Configuration changes').min(0, { message: 'Configuration changes cannot be negative' }).max(1000).default(2),
      changeMinutes: nonNegative('Minutes per change').max(1440).default(15),
      setupMinutes: nonNegative('Setup time').max(10_080).default(60),
    })
    .default({ points: 60, dwellSeconds: 30, configurationChanges: 2, changeMinutes: 15, setupMinutes: 60 }),
  /** A certified measured drag area to compare the estimate with, m² (evaluation only; saved plans keep their own link). */
  measuredDragArea: positive('Measured drag area').optional(),
});
export type PlanInput = z.infer<typeof planInputSchema>;
/** The input as a client writes it, before defaults are filled in. */
export type PlanInputDraft = z.input<typeof planInputSchema>;

/**
 * Body of `PUT /api/plans/:id/certified-result`: the valid result sheet of the plan's customer and the configuration
 * on it whose drag area at the yaw nearest 0° the estimate is compared with.
 */
export const certifiedResultLinkSchema = z.object({
  sheetId: z.uuid({ message: 'Choose a result sheet' }),
  configurationCode: z.string({ message: 'Choose a configuration' }).trim().min(1, { message: 'Choose a configuration' }).max(20),
});
export type CertifiedResultLinkBody = z.infer<typeof certifiedResultLinkSchema>;

/** Where a plan's measured value comes from: one point of one configuration on an issued result sheet. */
export interface CertifiedResultSource {
  sheetId: string;
  reportNumber: string;
  /** The sheet's state now; a superseded sheet keeps the link until staff link the newer revision. */
  sheetState: 'valid' | 'superseded';
  configurationCode: string;
  configurationLabel: string;
  /** Yaw of the point taken (the one nearest 0°), deg. */
  yaw: number;
  /** C_D·S and its expanded uncertainty U (k = 2) as printed on the sheet, model scale, m². */
  sheetDragArea: number;
  sheetExpandedUncertainty: number;
  /** Full-scale to model length ratio of the sheet's article; full-scale C_D·A = C_D·S × scale². */
  scale: number;
  linkedBy: string;
  linkedAt: string;
}

/**
 * A plan's measured value: full-scale C_D·A in m² with its expanded uncertainty (k = 2), and where it comes from.
 * `certified` is null only for values typed in before plans were linked to issued sheets.
 */
export interface MeasuredLink {
  dragArea: number;
  expandedUncertainty: number | null;
  source: string;
  certified: CertifiedResultSource | null;
}

/** A configuration of a result sheet a plan can be linked to, with the point the link would take. */
export interface CertifiedCandidateConfiguration {
  code: string;
  label: string;
  yaw: number;
  sheetDragArea: number;
  sheetExpandedUncertainty: number;
  /** Full-scale C_D·A, m², and its U (k = 2). */
  dragArea: number;
  expandedUncertainty: number;
}

/** A valid result sheet of the plan's customer, as the staff link picker lists it. */
export interface CertifiedCandidate {
  sheetId: string;
  reportNumber: string;
  issueDate: string;
  testTitle: string;
  scale: number;
  configurations: CertifiedCandidateConfiguration[];
}

/** Answer of `GET /api/plans/:id/certified-candidates`: valid sheets newest first, with the caution. */
export interface CertifiedCandidateList {
  items: CertifiedCandidate[];
  caution: string;
}

/** Body of `POST /api/plans` and `PUT /api/plans/:id` (each save adds a version). */
export const planSaveSchema = z.object({
  name: z.string().trim().min(1, { message: 'Name the plan' }).max(120),
  input: planInputSchema,
  /** Customer organisation the plan belongs to: required from staff on create, ignored for customers. */
  organisationId: z.uuid({ message: 'Choose an organisation' }).optional(),
  /** Measured values come only from an issued result sheet, through `PUT /api/plans/:id/certified-result`. */
  measured: z
    .never({ message: 'A measured value comes only from a certified result sheet: link one to the saved plan instead of typing it' })
    .optional(),
  /** What changed in this version, shown in the history. */
  note: z.string().trim().max(300).default(''),
});
export type PlanSave = z.infer<typeof planSaveSchema>;

/** One saved version of a plan. */
export interface PlanVersion {
  id: string;
  version: number;
  input: PlanInput;
  note: string;
  createdBy: string;
  createdAt: string;
}

/** A plan as lists show it. */
export interface PlanSummary {
  id: string;
  organisationId: string;
  organisationName: string;
  name: string;
  currentVersion: number;
  /** Booking the plan is attached to; null until bookings take a plan. */
  bookingId: string | null;
  measured: MeasuredLink | null;
  createdAt: string;
  updatedAt: string;
}

/** A plan list answer, with the caution. */
export interface PlanList {
  items: PlanSummary[];
  caution: string;
}

/** A plan with its latest version and that version's evaluation. */
export interface PlanDetail extends PlanSummary {
  latest: PlanVersion;
  evaluation: PlanEvaluation;
  caution: string;
}

/** The versions of a plan, newest first. */
export interface PlanVersionList {
  items: PlanVersion[];
  caution: string;
}

/** Outcome of one tunnel-fit check. */
export type FitStatus = 'pass' | 'warn' | 'fail';

export interface PlanFitCheck {
  id: string;
  status: FitStatus;
  reason: string;
  value?: number;
}

export interface PlanPartWarning {
  code: 'RE_BELOW_RANGE' | 'RE_ABOVE_RANGE' | 'RE_RANGE_NOT_STATED';
  message: string;
}

/** One part of the build-up at full scale. */
export interface PlanPartResult {
  label: string;
  shapeId: string | null;
  count: number;
  /** Reference area of one item, m²; null for a custom part. */
  referenceArea: number | null;
  referenceAreaRule: string | null;
  frontalArea: number | null;
  characteristicLength: number | null;
  reynoldsNumber: number | null;
  edges: 'sharp' | 'rounded' | null;
  dragCoefficient: number | null;
  /** C_D·A of all items, m². */
  dragArea: number;
  drag: number;
  /** Fraction of the summed drag area, 0…1. */
  dragShare: number;
  warnings: PlanPartWarning[];
}

export interface WindCase {
  airspeed: number;
  drag: number;
  power: number;
}

/** Result of `POST /api/plans/evaluate`, and the evaluation inside a plan. */
export interface PlanEvaluation {
  caution: string;
  buildUp: {
    parts: PlanPartResult[];
    speed: number;
    density: number;
    viscosity: number;
    dynamicPressure: number;
    interferenceFactor: number;
    sumDragArea: number;
    totalDragArea: number;
    totalDrag: number;
    assumptions: string[];
  };
  tunnel: {
    id: string;
    name: string;
    kind: 'closed' | 'open_jet';
    sectionArea: number;
    maxSpeed: number;
    dragCapacity: number;
    /** Where the capacity came from: the request's `dragCapacity`, or a balance's Fx capacity. */
    capacitySource: 'request' | 'balance';
    balanceIdentifier: string | null;
  };
  fit: {
    checks: PlanFitCheck[];
    overall: FitStatus;
    modelFrontalArea: number;
    modelDragArea: number;
    loads: { speed: number; drag: number }[];
    assumptions: string[];
  };
  fullScale: {
    groundSpeed: number;
    windSpeed: number;
    /** Degrees, 0 = headwind. */
    windDirection: number;
    airspeed: number;
    /** Degrees. */
    yaw: number;
    drag: number;
    power: number;
  };
  powerSeries: { windSpeed: number; headwind: WindCase; tailwind: WindCase | null }[];
  duration: { hours: number; pointHours: number; changeHours: number; setupHours: number };
  /** Estimated versus measured C_D·A when a measured value is known. */
  measured: {
    dragArea: number;
    /** U (k = 2) of the measured value, m²; null for a value without one. */
    expandedUncertainty: number | null;
    source: string | null;
    estimatedDragArea: number;
    differencePercent: number;
  } | null;
}

/** An area rule of a library shape, without its evaluator. */
export interface ShapeAreaRule {
  basis: 'frontal' | 'planform' | 'face';
  formula: string;
  dimensions: (keyof PlanShapeDimensions)[];
}

/** One entry of `GET /api/shapes`. */
export interface ShapeInfo {
  id: string;
  label: string;
  kind: '2-d' | '3-d' | 'object';
  family: string;
  orientation: string;
  /** A tabulated C_D, or the name of the Reynolds-number curve used. */
  dragCoefficient: number | { curve: 'sphere' | 'cylinder' };
  referenceArea: ShapeAreaRule;
  frontalArea: ShapeAreaRule | null;
  characteristicLength: { dimension: keyof PlanShapeDimensions; description: string } | null;
  reynoldsRange: { min: number; max: number | null; basis: string } | null;
  edges: 'sharp' | 'rounded';
  typicalFrontalArea: number | null;
  source: { citation: string; corroboration: string | null };
  fromMemory: boolean;
  note: string | null;
}

export interface ShapeList {
  items: ShapeInfo[];
  caution: string;
}
