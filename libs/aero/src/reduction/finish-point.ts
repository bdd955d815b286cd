import { airDensity } from '../air';
import type { ReductionConfig } from '../config';
import {
  correctedDynamicPressure,
  correctedSpeed,
  frontalAreaSolidBlockage,
  horizontalBuoyancyDrag,
  maskellDynamicPressureRatio,
  openJetDynamicPressureRatio,
  streamlinedWakeBlockage,
  thomSolidBlockage,
} from '../corrections';
import { radiansToDegrees } from '../units';
import { coefficientUncertainty } from './coefficient-uncertainty';
import type { PointAccumulator } from './point-accumulator';
import type { ChannelSummary, CoefficientSet, CoefficientValue, PointCorrections, PointResult } from './reduction-result';
import type { ReductionWarning } from './reduction-warning';
import { SAMPLE_CHANNELS, type SampleChannel } from './sample-channels';

/** Mach number above which compressibility is no longer negligible (common practice). */
export const MACH_WARNING_LIMIT = 0.3;

/** Context shared by every point of a run. */
export interface PointContext {
  config: ReductionConfig;
  /** Factor q = factor·Δp_ref, or NaN when the file gives q. */
  dynamicPressureFactor: number;
  warnings: ReductionWarning[];
}

const COEFFICIENTS = [
  ['dragCoefficient', 'drag', false],
  ['liftCoefficient', 'lift', false],
  ['sideForceCoefficient', 'windSideForce', false],
  ['rollingMomentCoefficient', 'rollingMoment', true],
  ['pitchingMomentCoefficient', 'pitchingMoment', true],
  ['yawingMomentCoefficient', 'yawingMoment', true],
  ['axialForceCoefficient', 'axialForce', false],
] as const satisfies readonly (readonly [keyof CoefficientSet, SampleChannel, boolean])[];

/**
 * Turns the accumulated samples of one point into its result: means, corrections, corrected coefficients
 * with GUM uncertainty, drag area, drag counts, L/D; appends the point's warnings to `context.warnings`.
 *
 * @param accumulator - the point's running statistics
 * @param context - configuration, q factor and the warning list
 * @returns the point result (without the full-scale figures, added by the caller)
 * @throws {AeroInputError} when a correction refuses its input (e.g. a model larger than the section)
 */
export function finishPoint(accumulator: PointAccumulator, context: PointContext): PointResult {
  const { config, warnings } = context;
  const { article, tunnel } = config;
  const n = accumulator.sampleCount;
  const point = accumulator.point;
  const channels = Object.fromEntries(
    SAMPLE_CHANNELS.map((name, i) => {
      const s = accumulator.statistics;
      const summary: ChannelSummary = { mean: s.mean(i), standardDeviation: s.standardDeviation(i), standardError: s.standardError(i) };
      return [name, summary];
    }),
  ) as Record<SampleChannel, ChannelSummary>;
  const mean = (channel: SampleChannel) => channels[channel].mean;

  const qu = mean('dynamicPressure');
  const vu = mean('speed');
  const alpha = mean('pitch');
  const beta = -mean('yaw');
  const S = article.referenceArea;
  const L = article.referenceLength;

  // Horizontal buoyancy first, so that the wake blockage sees the drag of the model alone.
  const buoyancyDrag = config.corrections.horizontalBuoyancy
    ? horizontalBuoyancyDrag({ pressureGradient: tunnel.pressureGradient, modelVolume: article.modelVolume })
    : 0;
  const rawDrag = mean('dragCoefficient');
  const dragWithoutBuoyancy = rawDrag - buoyancyDrag / (qu * S);

  const corrections = blockage(config, dragWithoutBuoyancy);
  const qc = correctedDynamicPressure(qu, corrections.totalBlockage);
  const vc = correctedSpeed(vu, corrections.totalBlockage);
  const ratio = qu / qc;
  corrections.dynamicPressureRatio = qc / qu;
  corrections.buoyancyDrag = buoyancyDrag;
  corrections.buoyancyDragCoefficient = buoyancyDrag / (qc * S);

  const u = config.uncertainty;
  const qUncertainty = Number.isNaN(context.dynamicPressureFactor) ? u.dynamicPressure : context.dynamicPressureFactor * u.dynamicPressure;
  const loadUncertainty = windAndBodyLoadUncertainties(config, alpha, beta);
  const reference = (moment: boolean) => ({ referenceArea: S, referenceAreaKind: article.referenceAreaKind, ...(moment ? { referenceLength: L } : {}) });
  const uncorrected = {} as Record<keyof CoefficientSet, CoefficientValue>;
  const corrected = {} as Record<keyof CoefficientSet, CoefficientValue>;
  for (const [name, load, moment] of COEFFICIENTS) {
    const raw = mean(name);
    let value = raw * ratio;
    if (name === 'dragCoefficient') value = dragWithoutBuoyancy * ratio;
    if (name === 'axialForceCoefficient') value = (raw - (buoyancyDrag * Math.cos(alpha) * Math.cos(beta)) / (qu * S)) * ratio;
    uncorrected[name] = { value: raw, ...reference(moment) };
    corrected[name] = {
      value,
      ...reference(moment),
      uncertainty: coefficientUncertainty({
        coefficient: value,
        correctedDynamicPressure: qc,
        dynamicPressure: qu,
        dynamicPressureUncertainty: qUncertainty,
        loadUncertainty: loadUncertainty[load],
        referenceArea: S,
        referenceAreaUncertainty: u.referenceArea,
        ...(moment ? { referenceLength: L, referenceLengthUncertainty: u.referenceLength } : {}),
        sampleStandardDeviation: channels[name].standardDeviation * ratio,
        sampleCount: n,
      }),
    };
  }

  const rho = mean('density');
  const densityUncertainty = densityStandardUncertainty(config, mean('barometricPressure'), mean('temperature'), mean('relativeHumidity'));
  const result: PointResult = {
    point,
    sampleCount: n,
    firstLine: accumulator.firstLine,
    lastLine: accumulator.lastLine,
    yaw: radiansToDegrees(mean('yaw')),
    pitch: radiansToDegrees(alpha),
    density: rho,
    viscosity: mean('viscosity'),
    kinematicViscosity: mean('kinematicViscosity'),
    speedOfSound: mean('speedOfSound'),
    uncorrectedDynamicPressure: qu,
    correctedDynamicPressure: qc,
    uncorrectedSpeed: vu,
    correctedSpeed: vc,
    reynoldsNumber: mean('reynoldsNumber'),
    machNumber: mean('machNumber'),
    densityStandardUncertainty: densityUncertainty,
    // V = √(2q/ρ): u_r(V)² = ¼[u_r(q)² + u_r(ρ)²] (GUM §5.1.6, power-law form).
    speedRelativeStandardUncertainty: 0.5 * Math.hypot(qUncertainty / qu, densityUncertainty / rho),
    windAxisLoads: { drag: mean('drag'), lift: mean('lift'), sideForce: mean('windSideForce') },
    bodyAxisLoads: {
      axialForce: mean('axialForce'),
      sideForce: mean('sideForce'),
      normalForce: mean('normalForce'),
      rollingMoment: mean('rollingMoment'),
      pitchingMoment: mean('pitchingMoment'),
      yawingMoment: mean('yawingMoment'),
    },
    corrections,
    uncorrected,
    corrected,
    dragArea: corrected.dragCoefficient.value * S,
    dragCounts: corrected.dragCoefficient.value * 1e4,
    liftToDragRatio: corrected.dragCoefficient.value === 0 ? null : corrected.liftCoefficient.value / corrected.dragCoefficient.value,
    channels,
  };
  pointWarnings(accumulator, result, context.config, warnings);
  return result;
}

/** ε's of the chosen methods (closed section) or the facility's open-jet constants. */
function blockage(config: ReductionConfig, dragCoefficient: number): PointCorrections {
  const { tunnel, article, corrections: chosen } = config;
  const base: PointCorrections = {
    tunnelKind: tunnel.kind,
    solidBlockageMethod: tunnel.kind === 'closed' ? chosen.solidBlockage : 'open-jet-constants',
    wakeBlockageMethod: tunnel.kind === 'closed' ? chosen.wakeBlockage : 'open-jet-constants',
    horizontalBuoyancy: chosen.horizontalBuoyancy,
    solidBlockage: 0,
    wakeBlockage: 0,
    jetExpansion: 0,
    nozzleBlockage: 0,
    collectorBlockage: 0,
    totalBlockage: 0,
    dynamicPressureRatio: 1,
    buoyancyDrag: 0,
    buoyancyDragCoefficient: 0,
  };
  if (tunnel.kind === 'open_jet') {
    const { jetExpansion, nozzleBlockage, collectorBlockage } = tunnel.openJet;
    const ratio = openJetDynamicPressureRatio({ jetExpansion, nozzleBlockage, collectorBlockage });
    return { ...base, jetExpansion, nozzleBlockage, collectorBlockage, totalBlockage: Math.sqrt(ratio) - 1 };
  }
  const C = tunnel.sectionArea;
  let solid = 0;
  if (chosen.solidBlockage === 'thom') {
    solid = thomSolidBlockage({ bodyShapeFactor: article.bodyShapeFactor, tunnelShapeFactor: tunnel.tunnelShapeFactor ?? NaN, modelVolume: article.modelVolume, sectionArea: C });
  } else if (chosen.solidBlockage === 'frontal-area') {
    solid = frontalAreaSolidBlockage({ frontalArea: article.frontalArea ?? article.referenceArea, sectionArea: C });
  } else if (chosen.solidBlockage === 'given') {
    solid = chosen.givenSolidBlockage;
  }
  let wake = 0;
  if (chosen.wakeBlockage === 'streamlined') {
    wake = streamlinedWakeBlockage({ referenceArea: article.referenceArea, sectionArea: C, uncorrectedDragCoefficient: dragCoefficient });
  } else if (chosen.wakeBlockage === 'maskell') {
    // Maskell gives the ratio q_c/q_u; its equivalent ε_wb makes (1 + ε_wb)² equal to that ratio.
    const ratio = maskellDynamicPressureRatio({ uncorrectedDragCoefficient: dragCoefficient, referenceArea: article.referenceArea, sectionArea: C, theta: chosen.maskellTheta });
    wake = Math.sqrt(ratio) - 1;
  } else if (chosen.wakeBlockage === 'given') {
    wake = chosen.givenWakeBlockage;
  }
  return { ...base, solidBlockage: solid, wakeBlockage: wake, totalBlockage: solid + wake };
}

/**
 * Standard uncertainties of the wind-axis forces and body-axis moments from those of the six components,
 * uncorrelated: D, L, Y_w through the axis rotation, moments through the transfer r × F.
 */
function windAndBodyLoadUncertainties(config: ReductionConfig, alpha: number, beta: number): Record<SampleChannel, number> {
  const [ua, uy, un, umx, umy, umz] = config.uncertainty.loads;
  const [rx, ry, rz] = config.balance.centreOffset;
  const ca = Math.cos(alpha);
  const sa = Math.sin(alpha);
  const cb = Math.cos(beta);
  const sb = Math.sin(beta);
  const out = {} as Record<SampleChannel, number>;
  out.drag = Math.hypot(ca * cb * ua, sa * cb * un, sb * uy);
  out.lift = Math.hypot(ca * un, sa * ua);
  out.windSideForce = Math.hypot(ca * sb * ua, sa * sb * un, cb * uy);
  out.axialForce = ua;
  out.rollingMoment = Math.hypot(umx, ry * un, rz * uy);
  out.pitchingMoment = Math.hypot(umy, rz * ua, rx * un);
  out.yawingMoment = Math.hypot(umz, rx * uy, ry * ua);
  return out;
}

/**
 * Standard uncertainty of the air density from those of p, T and RH, by central differences of the model
 * (GUM §5.1.3, numerical sensitivity coefficients).
 */
function densityStandardUncertainty(config: ReductionConfig, pressure: number, temperature: number, relativeHumidity: number): number {
  const u = config.uncertainty;
  const rho = (p: number, t: number, h: number) => airDensity(config.densityModel, { pressure: p, temperature: t, relativeHumidity: Math.min(1, Math.max(0, h)) });
  const dp = 1;
  const dt = 0.01;
  const dh = 1e-4;
  const cp = (rho(pressure + dp, temperature, relativeHumidity) - rho(pressure - dp, temperature, relativeHumidity)) / (2 * dp);
  const ct = (rho(pressure, temperature + dt, relativeHumidity) - rho(pressure, temperature - dt, relativeHumidity)) / (2 * dt);
  const hUp = Math.min(1, relativeHumidity + dh);
  const hDown = Math.max(0, relativeHumidity - dh);
  const ch = (rho(pressure, temperature, hUp) - rho(pressure, temperature, hDown)) / (hUp - hDown);
  return Math.hypot(cp * u.barometricPressure, ct * u.temperature, ch * u.relativeHumidity);
}

function pointWarnings(accumulator: PointAccumulator, result: PointResult, config: ReductionConfig, warnings: ReductionWarning[]): void {
  const point = result.point;
  if (result.machNumber > MACH_WARNING_LIMIT) {
    warnings.push({ code: 'MACH_OVER_0_3', point, message: `point ${point}: mean Mach number ${result.machNumber.toFixed(3)} exceeds ${MACH_WARNING_LIMIT}; compressibility is no longer negligible` });
  }
  if (accumulator.overCapacity > 0) {
    warnings.push({ code: 'LOAD_OVER_CAPACITY', point, message: `point ${point}: ${accumulator.overCapacity} of ${result.sampleCount} samples have a balance component over its capacity` });
  }
  if (result.sampleCount < config.minimumSamplesPerPoint) {
    warnings.push({ code: 'FEW_SAMPLES', point, message: `point ${point}: ${result.sampleCount} samples, fewer than the configured minimum of ${config.minimumSamplesPerPoint}` });
  }
  if (accumulator.outsideCipmValidity > 0) {
    warnings.push({
      code: 'CIPM_OUT_OF_VALIDITY',
      point,
      message: `point ${point}: ${accumulator.outsideCipmValidity} samples have an air state outside the CIPM-2007 range (600–1100 hPa, 15–27 °C)`,
    });
  }
}
