import { z } from 'zod';

/**
 * Test articles, balances and calibrations, tests, runs, raw files and reductions. All physical quantities
 * are SI (m, m², m³, N, N·m, Pa, m/s); angles are degrees; dates are `YYYY-MM-DD`; times ISO 8601 UTC.
 */

const positive = (what: string) => z.number({ message: `${what} must be a number` }).finite().positive({ message: `${what} must be greater than zero` });
const finite = (what: string) => z.number({ message: `${what} must be a number` }).finite();
const text = (max: number) => z.string().trim().max(max);
const date = z.iso.date({ message: 'Use a date in the form YYYY-MM-DD' });

export const articleKindSchema = z.enum(['road_vehicle', 'building', 'sports_equipment', 'aircraft_component', 'sphere', 'other']);
export type ArticleKind = z.infer<typeof articleKindSchema>;
export const referenceAreaKindSchema = z.enum(['frontal', 'planform', 'wetted', 'other']);
export type ReferenceAreaKind = z.infer<typeof referenceAreaKindSchema>;

/** A test article as written by staff. */
export const articleInputSchema = z.object({
  organisationId: z.uuid({ message: 'Choose the customer organisation' }),
  name: text(120).min(1, { message: 'Enter a name' }),
  description: text(2000).default(''),
  kind: articleKindSchema,
  conditionOnReceipt: text(2000).default(''),
  /** Day the laboratory received the item; stated on certified sheets. Null while not recorded. */
  receivedOn: date.nullable().default(null),
  /** Reference area S, m². */
  referenceArea: positive('Reference area'),
  referenceAreaKind: referenceAreaKindSchema,
  /** Reference length L, m. */
  referenceLength: positive('Reference length'),
  /** Model volume, m³. */
  volume: z.number().finite().min(0, { message: 'Volume cannot be negative' }).default(0),
  /** Frontal area, m²; omit when the reference area is the frontal area. */
  frontalArea: positive('Frontal area').nullable().default(null),
  /** Moment reference centre in body axes, m. */
  momentCentre: z.object({ x: finite('x'), y: finite('y'), z: finite('z') }).default({ x: 0, y: 0, z: 0 }),
  /** Full-scale length / model length. */
  scale: positive('Scale').default(1),
});
export type ArticleInput = z.infer<typeof articleInputSchema>;

export const articleSchema = articleInputSchema.extend({ id: z.uuid(), createdAt: z.iso.datetime(), updatedAt: z.iso.datetime() });
export type Article = z.infer<typeof articleSchema>;

export const articleListQuerySchema = z.object({ organisationId: z.uuid().optional() });

const sixNumbers = z.array(z.number().finite(), { message: 'Give six numbers' }).length(6, { message: 'Give six numbers: Fx, Fy, Fz, Mx, My, Mz' });

/** A balance; capacities Fx, Fy, Fz in N and Mx, My, Mz in N·m. */
export const balanceInputSchema = z.object({
  identifier: text(80).min(1, { message: 'Enter the identifier' }),
  description: text(2000).default(''),
  capacities: sixNumbers.refine((values) => values.every((v) => v > 0), { message: 'Every capacity must be greater than zero' }),
  /** Tunnel the balance is installed in; the catalogue shows its capacities there. Null: not installed anywhere. */
  tunnelId: z.uuid({ message: 'Choose a tunnel from the list' }).nullable().default(null),
});
export type BalanceInput = z.infer<typeof balanceInputSchema>;

/** One version of a balance calibration: `linear` 6×6 and optional `interaction` 6×21 (mV/V per load unit). */
export const calibrationInputSchema = z
  .object({
    matrices: z.object({
      linear: z.array(sixNumbers).length(6, { message: 'The linear matrix has six rows' }),
      interaction: z.array(z.array(z.number().finite()).length(21, { message: 'Each interaction row has 21 numbers' })).length(6).optional(),
    }),
    calibratedOn: date,
    dueOn: date,
  })
  .refine((c) => c.dueOn >= c.calibratedOn, { message: 'The due date cannot be before the calibration date', path: ['dueOn'] });
export type CalibrationInput = z.infer<typeof calibrationInputSchema>;

export const calibrationSchema = z.object({
  id: z.uuid(),
  balanceId: z.uuid(),
  version: z.number().int(),
  matrices: z.object({ linear: z.array(z.array(z.number())), interaction: z.array(z.array(z.number())).optional() }),
  calibratedOn: z.string(),
  dueOn: z.string(),
  /** Whether the due date has passed (today, UTC). */
  overdue: z.boolean(),
  enteredBy: z.uuid(),
  createdAt: z.iso.datetime(),
});
export type Calibration = z.infer<typeof calibrationSchema>;

/** GET /api/balances/:id/calibrations: one version with the name of the lab manager who entered it. */
export const calibrationVersionSchema = calibrationSchema.extend({ enteredByName: z.string() });
export type CalibrationVersion = z.infer<typeof calibrationVersionSchema>;

export const balanceSchema = balanceInputSchema.extend({
  id: z.uuid(),
  currentCalibration: calibrationSchema.nullable(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
export type Balance = z.infer<typeof balanceSchema>;

/** A lab manager's reason for letting a test be reduced with its balance's overdue calibration. */
export const calibrationOverrideInputSchema = z.object({
  reason: text(2000).min(10, { message: 'Explain the reason in at least 10 characters' }),
});

/** A lab manager's recorded override of an overdue calibration for one test. */
export const calibrationOverrideSchema = z.object({
  id: z.uuid(),
  testId: z.uuid(),
  calibrationId: z.uuid(),
  reason: z.string(),
  grantedBy: z.uuid(),
  createdAt: z.iso.datetime(),
});
export type CalibrationOverrideView = z.infer<typeof calibrationOverrideSchema>;

/**
 * Staff's view of the calibration a test's runs are reduced with: the balance, its current version and whether it is
 * past due, and the override on record for that version, if any.
 */
export const testCalibrationStateSchema = z.object({
  balanceId: z.uuid(),
  balanceIdentifier: z.string(),
  /** The balance's newest calibration; null when it has none yet. */
  calibration: z.object({ id: z.uuid(), version: z.number().int(), calibratedOn: z.string(), dueOn: z.string(), overdue: z.boolean() }).nullable(),
  /** The override of this test for the current version, once a lab manager has recorded one. */
  override: calibrationOverrideSchema.extend({ grantedByName: z.string() }).nullable(),
});
export type TestCalibrationState = z.infer<typeof testCalibrationStateSchema>;

export const testStateSchema = z.enum(['planned', 'running', 'complete', 'cancelled']);
export type TestState = z.infer<typeof testStateSchema>;

/** A named model configuration of a test (e.g. "mirrors off"). */
export const testConfigurationSchema = z.object({ label: text(80).min(1), description: text(2000).default('') });
export type TestConfiguration = z.infer<typeof testConfigurationSchema>;

export const correctionsMethodSchema = z.object({
  solidBlockage: z.enum(['thom', 'frontal-area', 'given', 'none']).optional(),
  givenSolidBlockage: z.number().finite().optional(),
  wakeBlockage: z.enum(['streamlined', 'maskell', 'given', 'none']).optional(),
  givenWakeBlockage: z.number().finite().optional(),
  maskellTheta: z.number().finite().positive().optional(),
  horizontalBuoyancy: z.boolean().optional(),
});
export const densityModelSchema = z.enum(['cipm-2007', 'ideal-gas-buck']);

/**
 * Reduction settings of a test, merged into the configuration built from tunnel, article and balance.
 * Nested values are those of the engine's configuration (zeros in N, N·m or mV/V; uncertainties k = 1).
 */
export const reductionSettingsSchema = z.object({
  corrections: correctionsMethodSchema.optional(),
  densityModel: densityModelSchema.optional(),
  zeros: z.record(z.string(), z.unknown()).optional(),
  uncertainty: z.record(z.string(), z.unknown()).optional(),
  fullScale: z.record(z.string(), z.unknown()).optional(),
  windAveraging: z.record(z.string(), z.unknown()).optional(),
  qFactor: z.number().finite().positive().optional(),
  minimumSamplesPerPoint: z.number().int().min(1).optional(),
  /** Balance moment centre relative to the moment reference centre, body axes, m. */
  centreOffset: z.array(z.number().finite()).length(3).optional(),
});
export type ReductionSettings = z.infer<typeof reductionSettingsSchema>;

export const testInputSchema = z.object({
  organisationId: z.uuid({ message: 'Choose the customer organisation' }),
  articleId: z.uuid({ message: 'Choose the test article' }),
  tunnelId: z.uuid({ message: 'Choose the tunnel' }),
  balanceId: z.uuid().nullable().default(null),
  title: text(200).min(1, { message: 'Enter a title' }),
  state: testStateSchema.default('planned'),
  configurations: z.array(testConfigurationSchema).max(200).default([]),
  reductionSettings: reductionSettingsSchema.default({}),
});
export type TestInput = z.infer<typeof testInputSchema>;

export const testSchema = testInputSchema.extend({
  id: z.uuid(),
  bookingId: z.uuid().nullable(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
export type Test = z.infer<typeof testSchema>;

export const runKindSchema = z.enum(['data', 'wind_off_zero', 'weight_tare', 'sphere_calibration']);
export type RunKind = z.infer<typeof runKindSchema>;

export const runInputSchema = z.object({
  /** Omit to take the next free number of the test. */
  runNumber: z.number().int().positive().optional(),
  kind: runKindSchema.default('data'),
  configurationLabel: text(80).default(''),
  notes: text(4000).default(''),
});
export type RunInput = z.infer<typeof runInputSchema>;

export const rawFileSchema = z.object({
  id: z.uuid(),
  runId: z.uuid(),
  originalName: z.string(),
  /** Bytes. */
  size: z.number().int(),
  sha256: z.string().length(64),
  createdAt: z.iso.datetime(),
});
export type RawFileSummary = z.infer<typeof rawFileSchema>;

export const runSchema = z.object({
  id: z.uuid(),
  testId: z.uuid(),
  runNumber: z.number().int(),
  kind: runKindSchema,
  configurationLabel: z.string(),
  notes: z.string(),
  rawFiles: z.array(rawFileSchema),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
export type Run = z.infer<typeof runSchema>;

export const reductionStateSchema = z.enum(['queued', 'running', 'done', 'failed']);
export type ReductionState = z.infer<typeof reductionStateSchema>;

/** What an analyst may change when reducing a run again; anything omitted is taken from the test. */
export const reductionOverridesSchema = z.object({
  corrections: correctionsMethodSchema.optional(),
  densityModel: densityModelSchema.optional(),
  /** Reference area S, m², and what it is. */
  referenceArea: z.number().finite().positive().optional(),
  referenceAreaKind: referenceAreaKindSchema.optional(),
  qFactor: z.number().finite().positive().optional(),
  minimumSamplesPerPoint: z.number().int().min(1).optional(),
});
export type ReductionOverrides = z.infer<typeof reductionOverridesSchema>;

/** Multipart fields of an upload beside the `file` part: optional overrides as a JSON string. */
export const uploadFieldsSchema = z.object({
  overrides: z
    .string()
    .optional()
    .transform((value, ctx) => {
      if (value === undefined || value === '') return {};
      try {
        return JSON.parse(value) as unknown;
      } catch {
        ctx.addIssue({ code: 'custom', message: 'overrides must be a JSON object' });
        return z.NEVER;
      }
    })
    .pipe(reductionOverridesSchema),
  /** A saved import profile of the lab to read the file through; the raw file stays the bytes sent. */
  profileId: z.uuid({ message: 'Choose a saved import profile' }).optional(),
});

/** Multipart fields of a preview beside the `file` part: an import profile as JSON, or a saved one. */
export const previewFieldsSchema = z.object({
  profile: z.string().optional(),
  profileId: z.uuid({ message: 'Choose a saved import profile' }).optional(),
});

/**
 * Multipart fields of saving an import profile beside the `file` part, a sample file the profile must
 * read without issues: `profile` is the ImportProfile as a JSON string.
 */
export const importProfileFieldsSchema = z.object({
  name: text(120).min(1, { message: 'Enter a name' }),
  description: text(2000).default(''),
  profile: z.string({ message: 'Give the import profile as JSON' }).min(1, { message: 'Give the import profile as JSON' }),
});

/** A saved import profile of the lab. */
export const savedImportProfileSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  description: z.string(),
  profile: z.record(z.string(), z.unknown()),
  createdBy: z.uuid(),
  archived: z.boolean(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
export type SavedImportProfile = z.infer<typeof savedImportProfileSchema>;

export const importProfileListQuerySchema = z.object({
  /** Whether archived profiles are listed too. */
  archived: z.enum(['true', 'false']).default('false').transform((v) => v === 'true'),
});

export const reductionErrorSchema = z.object({
  code: z.string(),
  message: z.string(),
  line: z.number().int().nullable(),
  column: z.number().int().nullable(),
});

export const reductionSchema = z.object({
  id: z.uuid(),
  runId: z.uuid(),
  rawFileId: z.uuid(),
  version: z.number().int(),
  engineVersion: z.string(),
  state: reductionStateSchema,
  /** Fraction 0–1. */
  progress: z.number(),
  error: reductionErrorSchema.nullable(),
  inputSha256: z.string(),
  config: z.record(z.string(), z.unknown()),
  warnings: z.array(z.record(z.string(), z.unknown())),
  summary: z.record(z.string(), z.unknown()).nullable(),
  pointCount: z.number().int(),
  /** Always present: tunnel data are not design values. */
  caution: z.string(),
  createdBy: z.uuid(),
  startedAt: z.iso.datetime().nullable(),
  finishedAt: z.iso.datetime().nullable(),
  createdAt: z.iso.datetime(),
});
export type ReductionView = z.infer<typeof reductionSchema>;

/** Answer of an accepted upload (202): the stored file and the queued reduction, if the run kind is reduced. */
export const uploadResultSchema = z.object({ rawFile: rawFileSchema, reduction: reductionSchema.nullable() });

export const pointSchema = z.object({
  index: z.number().int(),
  pointNumber: z.number().int(),
  sampleCount: z.number().int(),
  yaw: z.number(),
  pitch: z.number(),
  dynamicPressure: z.number().nullable(),
  speed: z.number().nullable(),
  reynoldsNumber: z.number().nullable(),
  cdUncorrected: z.number().nullable(),
  cdCorrected: z.number().nullable(),
  clCorrected: z.number().nullable(),
  csCorrected: z.number().nullable(),
  dragCounts: z.number().nullable(),
  result: z.record(z.string(), z.unknown()),
});
export const pointPageSchema = z.object({ items: z.array(pointSchema), total: z.number().int(), caution: z.string() });

export const pointsQuerySchema = z.object({
  offset: z.coerce.number().int().min(0).default(0),
  limit: z.coerce.number().int().min(1).max(5000).default(1000),
  /** Whether to include the engine's full per-point result (default: key columns only). */
  full: z
    .enum(['true', 'false'])
    .default('false')
    .transform((v) => v === 'true'),
});

export const compareQuerySchema = z.object({
  from: z.coerce.number().int().positive({ message: 'from is a reduction version number' }),
  to: z.coerce.number().int().positive({ message: 'to is a reduction version number' }),
});

/** One point side by side in two versions; drag counts are 10⁴·C_D (corrected). */
export const comparisonRowSchema = z.object({
  pointNumber: z.number().int(),
  yaw: z.number().nullable(),
  fromDragCounts: z.number().nullable(),
  toDragCounts: z.number().nullable(),
  /** to − from, drag counts; null when the point is missing in one version. */
  differenceDragCounts: z.number().nullable(),
});
export const comparisonSchema = z.object({
  runId: z.uuid(),
  from: z.number().int(),
  to: z.number().int(),
  rows: z.array(comparisonRowSchema),
  caution: z.string(),
});

/** Answer of a preview: what the reader understood, the first rows, or every issue with its location. */
export const previewSchema = z.object({
  fileName: z.string(),
  valid: z.boolean(),
  header: z
    .object({
      metadata: z.record(z.string(), z.string()),
      columns: z.array(z.object({ name: z.string(), unit: z.string(), channel: z.string(), siUnit: z.string() })),
      loadKind: z.enum(['loads', 'bridges']),
      pressureKind: z.enum(['dynamic', 'reference']),
      delimiter: z.string(),
    })
    .nullable(),
  sampleCount: z.number().int(),
  pointCount: z.number().int(),
  firstSamples: z.array(z.record(z.string(), z.unknown())),
  issues: z.array(z.object({ code: z.string(), message: z.string(), fileName: z.string(), line: z.number().int(), column: z.number().int() })),
});
export type Preview = z.infer<typeof previewSchema>;
