import type { ReductionConfig } from '../config';
import type { SampleChannel } from './sample-channels';
import type { ReductionWarning } from './reduction-warning';

/** Mean, sample standard deviation s and standard error s/√n of one channel over a point. */
export interface ChannelSummary {
  mean: number;
  standardDeviation: number;
  standardError: number;
}

/** GUM uncertainty of one corrected coefficient, with systematic and random parts shown apart (AIAA S-071A). */
export interface CoefficientUncertainty {
  /** Sensitivity coefficients ∂C/∂x_i: force or moment (1/N, 1/(N·m)), q (1/Pa), S (1/m²), L (1/m). */
  sensitivities: { load: number; dynamicPressure: number; referenceArea: number; referenceLength: number };
  /** Systematic standard uncertainty u_B from the instrument uncertainties (k = 1). */
  systematicStandardUncertainty: number;
  /** Random standard uncertainty u_A = s/√N (k = 1). */
  randomStandardUncertainty: number;
  /** Combined standard uncertainty u_c = √(u_B² + u_A²). */
  combinedStandardUncertainty: number;
  /** Expanded uncertainty U = k·u_c with k = 2 (about 95 %). */
  expandedUncertainty: number;
  /** Systematic (bias) limit B = 2·u_B. */
  biasLimit: number;
  /** Precision limit P = 2S/√N. */
  precisionLimit: number;
  /** U95 = √(B² + P²). */
  u95: number;
}

/** One coefficient with what it is based on and, when corrected, its uncertainty. */
export interface CoefficientValue {
  value: number;
  referenceArea: number;
  referenceAreaKind: ReductionConfig['article']['referenceAreaKind'];
  /** Reference length of a moment coefficient, m (absent for forces). */
  referenceLength?: number;
  uncertainty?: CoefficientUncertainty;
}

/** The six wind-axis/body-axis coefficients and the body-axis axial-force coefficient. */
export interface CoefficientSet {
  dragCoefficient: CoefficientValue;
  liftCoefficient: CoefficientValue;
  sideForceCoefficient: CoefficientValue;
  rollingMomentCoefficient: CoefficientValue;
  pitchingMomentCoefficient: CoefficientValue;
  yawingMomentCoefficient: CoefficientValue;
  axialForceCoefficient: CoefficientValue;
}

/** Blockage, buoyancy and open-jet terms of one point, with the method names used. */
export interface PointCorrections {
  tunnelKind: 'closed' | 'open_jet';
  solidBlockageMethod: string;
  wakeBlockageMethod: string;
  horizontalBuoyancy: boolean;
  /** ε_sb (closed) — for an open jet, 0. */
  solidBlockage: number;
  /** ε_wb (closed) — for an open jet, 0. */
  wakeBlockage: number;
  /** Open-jet ε_s, ε_n, ε_c of the facility (0 for a closed section). */
  jetExpansion: number;
  nozzleBlockage: number;
  collectorBlockage: number;
  /** ε_t = ε_sb + ε_wb (closed) or ε_s + ε_n + ε_c (open jet). */
  totalBlockage: number;
  /** q_c/q_u = (1 + ε_t)². */
  dynamicPressureRatio: number;
  /** Horizontal-buoyancy drag ΔD_B = −(dp/dx)·V, N (0 when off); subtracted from the drag. */
  buoyancyDrag: number;
  /** Its coefficient ΔD_B/(q_c·S), subtracted from C_D. */
  buoyancyDragCoefficient: number;
}

/** Full-scale drag and power at the configured ground speed and wind. */
export interface FullScaleResult {
  /** Full-scale drag area C_D·λ²·S, m². */
  dragArea: number;
  /** Air speed seen by the vehicle, m/s. */
  airSpeed: number;
  /** Yaw angle of the relative wind, deg. */
  yawAngle: number;
  /** Drag along the relative wind, N. */
  drag: number;
  /** Power to overcome it at the ground speed, W. */
  power: number;
  /** Model Re over full-scale Re on the same length (scaled by λ). */
  reynoldsNumberRatio: number;
}

/** Everything reduced for one point (one set condition). */
export interface PointResult {
  point: number;
  sampleCount: number;
  firstLine: number;
  lastLine: number;
  /** Mean setpoints, deg. */
  yaw: number;
  pitch: number;
  /** Means of the air state and flow: ρ kg/m³, μ Pa·s, ν m²/s, a m/s, q and V (u = uncorrected, c = corrected). */
  density: number;
  viscosity: number;
  kinematicViscosity: number;
  speedOfSound: number;
  uncorrectedDynamicPressure: number;
  correctedDynamicPressure: number;
  uncorrectedSpeed: number;
  correctedSpeed: number;
  reynoldsNumber: number;
  machNumber: number;
  /** Standard uncertainty of ρ from p, T and RH, kg/m³, and the relative standard uncertainty of V. */
  densityStandardUncertainty: number;
  speedRelativeStandardUncertainty: number;
  /** Mean wind-axis loads, N: drag, lift, side force. */
  windAxisLoads: { drag: number; lift: number; sideForce: number };
  /** Mean body-axis loads about the moment reference centre, N and N·m. */
  bodyAxisLoads: { axialForce: number; sideForce: number; normalForce: number; rollingMoment: number; pitchingMoment: number; yawingMoment: number };
  corrections: PointCorrections;
  uncorrected: CoefficientSet;
  corrected: CoefficientSet;
  /** Corrected drag area C_D·S, m². */
  dragArea: number;
  /** Corrected C_D in drag counts (1 count = 0.0001). */
  dragCounts: number;
  /** Corrected C_L/C_D; null when C_D is 0. */
  liftToDragRatio: number | null;
  fullScale?: FullScaleResult;
  /** Mean, s and s/√n of every per-sample channel. */
  channels: Record<SampleChannel, ChannelSummary>;
}

/** Result of a whole run. */
export interface ReductionResult {
  engineVersion: string;
  /** SHA-256 of the input bytes, hex. */
  inputSha256: string;
  fileName: string;
  sampleCount: number;
  /** The run file's metadata lines. */
  metadata: Record<string, string>;
  loadKind: 'loads' | 'bridges';
  pressureKind: 'dynamic' | 'reference';
  /** q factor used when the file gives Δp_ref, else null. */
  dynamicPressureFactor: number | null;
  /** The full configuration used, defaults filled in. */
  config: ReductionConfig;
  points: PointResult[];
  /** Wind-averaged drag coefficient from the yaw sweep, when configured. */
  windAveraged?: { dragCoefficient: number; vehicleSpeed: number; windSpeed: number; method: string };
  warnings: ReductionWarning[];
  caution: string;
}
