import { z } from 'zod';

/**
 * The analyst's review of a test: every run with its finished reduction versions, the chosen version's points with
 * their expanded uncertainties (k = 2), warnings and exclusions, published sphere reference curves for sphere
 * calibration runs, and a full-scale estimate of drag and power in wind.
 * Units are SI (m/s, N, W, kg/m³); angles in degrees; 1 drag count = 0.0001 in C_D (common practice).
 */

/** GET /api/review/tests/:id: `reductionIds` (comma-separated) picks a version per run; other runs show their latest done one. */
export const testReviewQuerySchema = z.object({
  reductionIds: z
    .string()
    .optional()
    .transform((value, ctx) => {
      const ids = (value ?? '')
        .split(',')
        .map((id) => id.trim())
        .filter((id) => id.length > 0);
      if (ids.length > 200) {
        ctx.addIssue({ code: 'custom', message: 'Choose at most 200 reduction versions' });
        return z.NEVER;
      }
      for (const id of ids) {
        if (!z.uuid().safeParse(id).success) {
          ctx.addIssue({ code: 'custom', message: `"${id.slice(0, 40)}" is not a reduction id` });
          return z.NEVER;
        }
      }
      return ids;
    }),
});
export type TestReviewQuery = z.infer<typeof testReviewQuerySchema>;

const speed = (what: string, max: number) =>
  z
    .number({ message: `${what} must be a number in m/s` })
    .finite({ message: `${what} must be a finite number in m/s` })
    .max(max, { message: `${what} must be at most ${max} m/s` });

/** POST /api/review/reductions/:id/full-scale: the road condition to estimate drag and power at. */
export const fullScaleInputSchema = z.object({
  /** Vehicle speed over the ground, m/s. */
  groundSpeed: speed('Ground speed', 150).positive({ message: 'Ground speed must be greater than zero' }),
  /** Wind speed over the ground, m/s. */
  windSpeed: speed('Wind speed', 60).min(0, { message: 'Wind speed cannot be negative' }).default(0),
  /** Direction the wind comes from relative to the heading, deg: 0 = head wind, 90 = from the right, 180 = tail wind. */
  windDirection: z
    .number({ message: 'Wind direction must be a number in degrees' })
    .finite({ message: 'Wind direction must be a finite number in degrees' })
    .min(0, { message: 'Wind direction must be between 0° and 360°' })
    .max(360, { message: 'Wind direction must be between 0° and 360°' })
    .default(0),
  /** Full-scale air temperature, °C; with the pressure left out too, the air is ISA sea level. */
  airTemperature: z
    .number({ message: 'Air temperature must be a number in °C' })
    .finite({ message: 'Air temperature must be a finite number in °C' })
    .min(-40, { message: 'Air temperature must be between −40 °C and 55 °C' })
    .max(55, { message: 'Air temperature must be between −40 °C and 55 °C' })
    .optional(),
  /** Full-scale static air pressure, hPa; with the temperature left out too, the air is ISA sea level. */
  airPressure: z
    .number({ message: 'Air pressure must be a number in hPa' })
    .finite({ message: 'Air pressure must be a finite number in hPa' })
    .min(700, { message: 'Air pressure must be between 700 hPa and 1100 hPa' })
    .max(1100, { message: 'Air pressure must be between 700 hPa and 1100 hPa' })
    .optional(),
});
export type FullScaleInput = z.infer<typeof fullScaleInputSchema>;

/** A value with its expanded uncertainty U (k = 2); null U when the engine gave none. */
export const uncertainValueSchema = z.object({ value: z.number(), expandedUncertainty: z.number().nullable() });
export type UncertainValue = z.infer<typeof uncertainValueSchema>;

export const reviewWarningSchema = z.object({ code: z.string(), message: z.string() });
export type ReviewWarning = z.infer<typeof reviewWarningSchema>;

const personSchema = z.object({ id: z.uuid(), name: z.string() });

export const reviewExclusionSchema = z.object({ reason: z.string(), excludedBy: personSchema, createdAt: z.iso.datetime() });
export type ReviewExclusion = z.infer<typeof reviewExclusionSchema>;

/** One reduced point as the review shows it. */
export const reviewPointSchema = z.object({
  /** `reduction_points.index`, the key of the exclusion routes. */
  index: z.number().int(),
  pointNumber: z.number().int(),
  /** Mean yaw and pitch, deg. */
  yaw: z.number(),
  pitch: z.number(),
  /** Corrected speed, m/s. */
  speed: z.number().nullable(),
  reynoldsNumber: z.number().nullable(),
  dragCoefficient: uncertainValueSchema.nullable(),
  liftCoefficient: uncertainValueSchema.nullable(),
  sideForceCoefficient: uncertainValueSchema.nullable(),
  /** Corrected C_D in drag counts (1 count = 0.0001). */
  dragCounts: z.number().nullable(),
  warnings: z.array(reviewWarningSchema),
  exclusion: reviewExclusionSchema.nullable(),
});
export type ReviewPoint = z.infer<typeof reviewPointSchema>;

export const referenceCurveSampleSchema = z.object({
  id: z.string(),
  label: z.string(),
  source: z.string(),
  points: z.array(z.object({ reynoldsNumber: z.number(), dragCoefficient: z.number() })),
});
export type ReferenceCurveSample = z.infer<typeof referenceCurveSampleSchema>;

/** What a sphere calibration run says about the tunnel. */
export const sphereCalibrationSchema = z.object({
  referenceCurves: z.array(referenceCurveSampleSchema),
  /** Measured Re at which C_D falls through 0.3, from the included points; null with a reason when the sweep does not cross. */
  criticalReynoldsNumber: z.number().nullable(),
  turbulenceFactor: z.number().nullable(),
  reason: z.string().nullable(),
  source: z.string(),
});
export type SphereCalibration = z.infer<typeof sphereCalibrationSchema>;

export const reviewVersionSchema = z.object({
  id: z.uuid(),
  version: z.number().int(),
  engineVersion: z.string(),
  pointCount: z.number().int(),
  finishedAt: z.iso.datetime().nullable(),
  /** Whether the reduction was approved, which freezes its points and exclusions. */
  frozen: z.boolean(),
});
export type ReviewVersion = z.infer<typeof reviewVersionSchema>;

export const reviewRunSchema = z.object({
  id: z.uuid(),
  runNumber: z.number().int(),
  kind: z.string(),
  configurationLabel: z.string(),
  /** Finished versions, newest first. */
  versions: z.array(reviewVersionSchema),
  /** The version shown; null when the run has no finished reduction. */
  selected: z
    .object({
      reductionId: z.uuid(),
      version: z.number().int(),
      frozen: z.boolean(),
      points: z.array(reviewPointSchema),
      /** Warnings about the whole reduction. */
      warnings: z.array(reviewWarningSchema),
      sphere: sphereCalibrationSchema.nullable(),
    })
    .nullable(),
});
export type ReviewRun = z.infer<typeof reviewRunSchema>;

export const testReviewSchema = z.object({
  test: z.object({ id: z.uuid(), title: z.string(), state: z.string() }),
  runs: z.array(reviewRunSchema),
  caution: z.string(),
});
export type TestReview = z.infer<typeof testReviewSchema>;

/** Power needed at one wind direction; null figures where the measured sweep does not reach the yaw met. */
export const powerAtDirectionSchema = z.object({
  windDirection: z.number(),
  airSpeed: z.number(),
  /** Yaw of the relative wind, deg. */
  yawAngle: z.number(),
  dragCoefficient: z.number().nullable(),
  drag: z.number().nullable(),
  power: z.number().nullable(),
});
export type PowerAtDirection = z.infer<typeof powerAtDirectionSchema>;

const windAveragedSchema = z.object({
  vehicleSpeed: z.number(),
  windSpeed: z.number(),
  dragCoefficient: z.number().nullable(),
  /** Why there is no value (e.g. the sweep stops short of the yaw the wind needs). */
  reason: z.string().nullable(),
});

export const fullScaleEstimateSchema = z.object({
  reductionId: z.uuid(),
  input: z.object({ groundSpeed: z.number(), windSpeed: z.number(), windDirection: z.number(), airTemperature: z.number().optional(), airPressure: z.number().optional() }),
  /**
   * Full-scale air used: ISA sea level (`standard`) unless a temperature or pressure was entered, then dry air by the
   * ideal-gas law at the entered values (ISA sea level for the one left out). Density kg/m³, temperature K, pressure Pa.
   */
  air: z.object({ density: z.number(), temperature: z.number(), pressure: z.number(), standard: z.boolean() }),
  /** Scale λ = full-scale length / model length, and the full-scale reference area λ²·S, m². */
  scale: z.number(),
  referenceArea: z.number(),
  windAveraged: z.object({ standard: windAveragedSchema, atCondition: windAveragedSchema, method: z.string() }),
  /** The entered condition; `dragCoefficient` is the body-axis C_D at the relative-wind yaw. */
  condition: powerAtDirectionSchema.extend({ dragArea: z.number().nullable(), reason: z.string().nullable() }),
  /** Power against wind direction, 0° to 360° at the entered wind speed. */
  powerByDirection: z.array(powerAtDirectionSchema),
  reynoldsNumberRatio: z.object({
    modelReynoldsNumber: z.number(),
    fullScaleReynoldsNumber: z.number(),
    ratio: z.number(),
    note: z.string(),
  }),
  excludedPoints: z.number().int(),
  caution: z.string(),
});
export type FullScaleEstimate = z.infer<typeof fullScaleEstimateSchema>;
