import { z } from 'zod';

/** Six numbers in balance order Fx, Fy, Fz [N], Mx, My, Mz [N·m]. */
const sixVector = z.array(z.number().finite()).length(6);
/** A position [x, y, z] in body axes, m. */
const position = z.array(z.number().finite()).length(3);
const positive = z.number().finite().positive();
const nonNegative = z.number().finite().nonnegative();

const tunnelSchema = z
  .object({
    /** Facility name, for the record only. */
    name: z.string().default(''),
    /** Closed test section, or open jet (automotive 3/4-open section). */
    kind: z.enum(['closed', 'open_jet']),
    /** Test-section (closed) or nozzle-exit (open jet) cross-section area C, m². */
    sectionArea: positive,
    /** Section width, m (record only). */
    width: positive.optional(),
    /** Section height, m (record only). */
    height: positive.optional(),
    /** Tunnel-shape factor τ1 of the Thom/Herriot solid blockage, dimensionless. */
    tunnelShapeFactor: positive.optional(),
    /** Empty-tunnel static-pressure gradient dp/dx along the stream, Pa/m (horizontal buoyancy). */
    pressureGradient: z.number().finite().default(0),
    /** Open-jet interference constants ε of this facility (dimensionless), used when kind = open_jet. */
    openJet: z
      .object({
        jetExpansion: z.number().finite().default(0),
        nozzleBlockage: z.number().finite().default(0),
        collectorBlockage: z.number().finite().default(0),
      })
      .default({ jetExpansion: 0, nozzleBlockage: 0, collectorBlockage: 0 }),
  })
  .strict();

const articleSchema = z
  .object({
    name: z.string().default(''),
    /** Reference area S of every force coefficient, m². */
    referenceArea: positive,
    /** What S is; reported beside every coefficient. */
    referenceAreaKind: z.enum(['frontal', 'planform', 'wetted', 'other']),
    /** Reference length L for Reynolds number and moment coefficients, m. */
    referenceLength: positive,
    /** Model volume V, m³ (Thom solid blockage, horizontal buoyancy). */
    modelVolume: nonNegative.default(0),
    /** Frontal area A_front, m² (frontal-area blockage and blockage warnings); defaults to S when S is frontal. */
    frontalArea: positive.optional(),
    /** Body-shape factor K of Thom's short form (≈ 0.96 for a body, 0.90 for a wing), dimensionless. */
    bodyShapeFactor: positive.default(0.96),
    /** Moment reference centre in body axes, m. */
    momentReferenceCentre: position.default([0, 0, 0]),
    /** Scale λ = full-scale length / model length (1 for a full-size article). */
    scale: positive.default(1),
  })
  .strict();

const calibrationSchema = z
  .object({
    /** Primary sensitivities C1 (6×6), R = C1·F: row i gives bridge i in mV/V per N (or per N·m). */
    linear: z.array(sixVector).length(6),
    /**
     * Interaction matrix C2 (6×21) on H(F) = [F1²…F6², F1F2, F1F3 … F5F6] (squares, then products i<j in
     * row order), mV/V per N² (or N·N·m, (N·m)²). Omit for a linear balance.
     */
    interaction: z.array(z.array(z.number().finite()).length(21)).length(6).optional(),
    /** Convergence tolerance of the iteration: |ΔF_i| ≤ tolerance·max(|F_i|, 1 N or N·m). */
    tolerance: positive.default(1e-12),
    /** Iterations allowed before the reduction stops with NOT_CONVERGED. */
    maxIterations: z.number().int().min(1).max(1000).default(50),
  })
  .strict();

const tareSchema = z
  .object({
    /** Yaw breakpoints, deg, strictly increasing. */
    yaw: z.array(z.number().finite()).min(1),
    /** Pitch breakpoints, deg, strictly increasing. */
    pitch: z.array(z.number().finite()).min(1),
    /** Weight tare loads[yawIndex][pitchIndex] = six loads in balance axes, N and N·m. */
    loads: z.array(z.array(sixVector)),
  })
  .strict()
  .superRefine((tare, ctx) => {
    for (const key of ['yaw', 'pitch'] as const) {
      for (let i = 1; i < tare[key].length; i++) {
        if (!(tare[key][i] > tare[key][i - 1])) ctx.addIssue({ code: 'custom', path: [key, i], message: `${key} breakpoints must increase strictly` });
      }
    }
    if (tare.loads.length !== tare.yaw.length) ctx.addIssue({ code: 'custom', path: ['loads'], message: `needs one row per yaw breakpoint (${tare.yaw.length})` });
    tare.loads.forEach((row, i) => {
      if (row.length !== tare.pitch.length) ctx.addIssue({ code: 'custom', path: ['loads', i], message: `needs one entry per pitch breakpoint (${tare.pitch.length})` });
    });
  });

const balanceSchema = z
  .object({
    /** Capacity of each component, N and N·m, checked against the measured loads. */
    capacities: sixVector.optional(),
    /** Calibration of bridge outputs to loads; required when the run file gives bridges. */
    calibration: calibrationSchema.optional(),
    /** Position of the balance moment centre relative to the moment reference centre, body axes, m. */
    centreOffset: position.default([0, 0, 0]),
  })
  .strict();

const zerosSchema = z
  .object({
    /** Wind-off zero in load space, N and N·m (files that give loads). */
    loads: sixVector.default([0, 0, 0, 0, 0, 0]),
    /** Wind-off zero in bridge space, mV/V (files that give bridge outputs). */
    bridges: sixVector.default([0, 0, 0, 0, 0, 0]),
    /** Weight tares over yaw and pitch, interpolated bilinearly; omit for none. */
    tare: tareSchema.optional(),
  })
  .strict();

const correctionsSchema = z
  .object({
    solidBlockage: z.enum(['thom', 'frontal-area', 'given', 'none']).default('none'),
    /** ε_sb used when solidBlockage = given. */
    givenSolidBlockage: z.number().finite().default(0),
    wakeBlockage: z.enum(['streamlined', 'maskell', 'given', 'none']).default('none'),
    /** ε_wb used when wakeBlockage = given. */
    givenWakeBlockage: z.number().finite().default(0),
    /** Maskell's empirical factor θ (≈ 5/2 in 3-D). */
    maskellTheta: positive.default(2.5),
    /** Whether to remove the horizontal-buoyancy drag −(dp/dx)·V. */
    horizontalBuoyancy: z.boolean().default(false),
  })
  .strict();

const fullScaleSchema = z
  .object({
    /** Vehicle ground speed, m/s. */
    groundSpeed: positive,
    /** Wind speed, m/s. */
    windSpeed: nonNegative.default(0),
    /** Wind direction relative to the heading, deg (0 = headwind). */
    windDirection: z.number().finite().default(0),
    /** Full-scale air density, kg/m³ (ISA sea level by default). */
    density: positive.default(1.225),
    /** Full-scale air temperature, K, for its viscosity (ISA sea level by default). */
    temperature: positive.default(288.15),
  })
  .strict();

const windAveragingSchema = z
  .object({
    /** Vehicle speed, m/s (SAE J1252: 55 mph = 24.5872 m/s). */
    vehicleSpeed: positive.default(24.5872),
    /** Wind speed, m/s (SAE J1252: 7 mph = 3.12928 m/s). */
    windSpeed: nonNegative.default(3.12928),
  })
  .strict();

const uncertaintySchema = z
  .object({
    /** Standard uncertainty (k = 1) of each balance component, N and N·m (systematic). */
    loads: sixVector.default([0, 0, 0, 0, 0, 0]),
    /** Standard uncertainty of the dynamic pressure (or Δp_ref), Pa (systematic). */
    dynamicPressure: nonNegative.default(0),
    /** Standard uncertainty of the barometric pressure, Pa. */
    barometricPressure: nonNegative.default(0),
    /** Standard uncertainty of the air temperature, K. */
    temperature: nonNegative.default(0),
    /** Standard uncertainty of the relative humidity, fraction (0.01 = 1 % RH). */
    relativeHumidity: nonNegative.default(0),
    /** Standard uncertainty of the reference area, m². */
    referenceArea: nonNegative.default(0),
    /** Standard uncertainty of the reference length, m. */
    referenceLength: nonNegative.default(0),
  })
  .strict();

/** Schema of a reduction configuration; every unit is SI except angles (deg) in tares and wind direction. */
export const reductionConfigSchema = z
  .object({
    tunnel: tunnelSchema,
    article: articleSchema,
    balance: balanceSchema.default({ centreOffset: [0, 0, 0] }),
    zeros: zerosSchema.default({ loads: [0, 0, 0, 0, 0, 0], bridges: [0, 0, 0, 0, 0, 0] }),
    corrections: correctionsSchema.default({
      solidBlockage: 'none',
      givenSolidBlockage: 0,
      wakeBlockage: 'none',
      givenWakeBlockage: 0,
      maskellTheta: 2.5,
      horizontalBuoyancy: false,
    }),
    densityModel: z.enum(['cipm-2007', 'ideal-gas-buck']).default('cipm-2007'),
    /** Dynamic-pressure factor q = factor·Δp_ref; overrides the file's `# q_factor`. */
    qFactor: positive.optional(),
    fullScale: fullScaleSchema.optional(),
    windAveraging: windAveragingSchema.optional(),
    uncertainty: uncertaintySchema.default({
      loads: [0, 0, 0, 0, 0, 0],
      dynamicPressure: 0,
      barometricPressure: 0,
      temperature: 0,
      relativeHumidity: 0,
      referenceArea: 0,
      referenceLength: 0,
    }),
    /** Fewest samples a point should have; fewer gives FEW_SAMPLES. */
    minimumSamplesPerPoint: z.number().int().min(1).default(30),
  })
  .strict()
  .superRefine((config, ctx) => {
    const { solidBlockage } = config.corrections;
    if (solidBlockage === 'thom' && config.tunnel.tunnelShapeFactor === undefined) {
      ctx.addIssue({ code: 'custom', path: ['tunnel', 'tunnelShapeFactor'], message: 'is required when corrections.solidBlockage is thom' });
    }
    if (solidBlockage === 'thom' && !(config.article.modelVolume > 0)) {
      ctx.addIssue({ code: 'custom', path: ['article', 'modelVolume'], message: 'must be positive when corrections.solidBlockage is thom' });
    }
    if (solidBlockage === 'frontal-area' && config.article.frontalArea === undefined && config.article.referenceAreaKind !== 'frontal') {
      ctx.addIssue({ code: 'custom', path: ['article', 'frontalArea'], message: 'is required for frontal-area blockage unless the reference area is frontal' });
    }
    if (config.corrections.horizontalBuoyancy && !(config.article.modelVolume > 0)) {
      ctx.addIssue({ code: 'custom', path: ['article', 'modelVolume'], message: 'must be positive when corrections.horizontalBuoyancy is on' });
    }
  });

/** A parsed reduction configuration with every default filled in. */
export type ReductionConfig = z.infer<typeof reductionConfigSchema>;
/** A reduction configuration as written, before defaults. */
export type ReductionConfigInput = z.input<typeof reductionConfigSchema>;
