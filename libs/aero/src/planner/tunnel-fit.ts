import { ISA_SEA_LEVEL } from '../air';
import { AeroInputError } from '../errors';
import { requireNonNegative, requirePositive } from '../errors/require-number';
import { dynamicPressure, reynoldsNumber } from '../flow';
import { blockageCheck } from './blockage-check';
import type { BuildUpResult } from './build-up-result';
import type { FitCheck, FitStatus } from './fit-check';
import { loadCheck } from './load-check';
import { machCheck } from './mach-check';
import { PLANNER_CAUTION } from './planner-caution';
import { reynoldsCheck } from './reynolds-check';
import { speedLimitCheck } from './speed-limit-check';

/** The tunnel a test is planned for. */
export interface PlannedTunnel {
  /** Whether the test section is closed-walled or an open jet (blockage rules of thumb are for closed sections). */
  kind: 'closed-section' | 'open-jet';
  /** Test-section cross-section area, m². */
  sectionArea: number;
  /** Maximum speed, m/s. */
  maxSpeed: number;
  /** Balance capacities, N. */
  capacities: { drag: number };
  /** Test-section air; the build-up's density and viscosity, and ISA sea-level speed of sound, when omitted. */
  density?: number;
  viscosity?: number;
  speedOfSound?: number;
}

/** Inputs of {@link tunnelFit}. */
export interface TunnelFitInput {
  /** Build-up of the full-scale article at full-scale conditions. */
  buildUp: BuildUpResult;
  tunnel: PlannedTunnel;
  /** Length scale, model / full scale (dimensionless, > 0). */
  scale: number;
  /** Planned tunnel speeds, m/s. */
  speeds: readonly number[];
  /** Fractional allowance on predicted loads for yawed attitudes, e.g. 0.25 for +25 % (dimensionless, ≥ 0). */
  yawMargin: number;
}

/** Predicted model drag at one planned speed. */
export interface PlannedLoad {
  speed: number;
  /** q × λ² × C_D·A (full scale) × (1 + yaw margin), N. */
  drag: number;
}

/** Result of {@link tunnelFit}. */
export interface TunnelFitResult {
  checks: FitCheck[];
  /** Worst status among the checks. */
  overall: FitStatus;
  /** Model frontal area, m² (known parts only). */
  modelFrontalArea: number;
  /** Model drag area λ² × full-scale C_D·A, m². */
  modelDragArea: number;
  loads: PlannedLoad[];
  assumptions: string[];
  caution: string;
}

const RANK: Record<FitStatus, number> = { pass: 0, warn: 1, fail: 2 };

const FN = 'tunnelFit';

/**
 * Whether a planned test fits a tunnel: blockage, each planned speed against the tunnel maximum, predicted drag at
 * each speed (with the yaw margin) against the balance capacity, Mach number at the highest speed, and the Reynolds
 * number each part reaches at the highest speed against full scale. Model areas scale with λ², lengths with λ;
 * C_D is taken as unchanged between full scale and model.
 *
 * Source: thresholds as documented in `fit-thresholds`; scaling by geometric similarity (definition).
 *
 * @param input build-up, tunnel, scale λ, planned speeds (m/s), yaw margin (fraction)
 * @returns every check, the worst status, model areas, loads, assumptions and the planner caution
 * @throws {AeroInputError} `NOT_FINITE` or `OUT_OF_RANGE` when the scale, a speed or a tunnel figure is not finite
 *   and positive or the yaw margin is negative; `EMPTY_INPUT` when no speed is planned
 * @example
 * // buildUp: a 2 m × 0.1 m cylinder in cross-flow at 10 m/s, ISA sea level
 * tunnelFit({ buildUp, tunnel: { kind: 'closed-section', sectionArea: 2, maxSpeed: 50, capacities: { drag: 500 } }, scale: 0.5, speeds: [20, 40], yawMargin: 0.2 }).overall // 'pass'
 */
export function tunnelFit(input: TunnelFitInput): TunnelFitResult {
  const { buildUp, tunnel, scale, speeds, yawMargin } = input;
  requirePositive(FN, 'scale', scale, '');
  requirePositive(FN, 'section area', tunnel.sectionArea, 'm²');
  requirePositive(FN, 'maximum speed', tunnel.maxSpeed, 'm/s');
  requirePositive(FN, 'drag capacity', tunnel.capacities.drag, 'N');
  requireNonNegative(FN, 'yaw margin', yawMargin, '');
  if (speeds.length === 0) throw new AeroInputError('EMPTY_INPUT', `\`${FN}\` requires at least one planned speed`);
  for (const speed of speeds) requirePositive(FN, 'planned speed', speed, 'm/s');
  const density = tunnel.density ?? buildUp.density;
  const viscosity = tunnel.viscosity ?? buildUp.viscosity;
  const soundSpeed = tunnel.speedOfSound ?? ISA_SEA_LEVEL.speedOfSound;
  requirePositive(FN, 'tunnel density', density, 'kg/m³');
  requirePositive(FN, 'tunnel viscosity', viscosity, 'Pa·s');
  requirePositive(FN, 'speed of sound', soundSpeed, 'm/s');

  const areaScale = scale * scale;
  const uncounted = buildUp.parts.filter((part) => part.frontalArea === null).map((part) => part.label);
  const modelFrontalArea = buildUp.parts.reduce((sum, part) => sum + (part.frontalArea ?? 0), 0) * areaScale;
  const modelDragArea = buildUp.totalDragArea * areaScale;
  const topSpeed = Math.max(...speeds);

  const loads = speeds.map((speed) => ({ speed, drag: dynamicPressure(density, speed) * modelDragArea * (1 + yawMargin) }));
  const checks: FitCheck[] = [
    blockageCheck({ modelFrontalArea, sectionArea: tunnel.sectionArea, uncountedParts: uncounted }),
    ...speeds.map((speed) => speedLimitCheck(speed, tunnel.maxSpeed)),
    ...loads.map((load) => loadCheck({ speed: load.speed, load: load.drag, capacity: tunnel.capacities.drag, component: 'drag' })),
    machCheck(topSpeed, soundSpeed),
    ...buildUp.parts.map((part, index) =>
      reynoldsCheck({
        index,
        label: part.label,
        edges: part.edges,
        modelReynolds:
          part.characteristicLength === null ? null : reynoldsNumber(density, topSpeed, part.characteristicLength * scale, viscosity),
        fullScaleReynolds: part.reynoldsNumber,
      }),
    ),
  ];
  const overall = checks.reduce<FitStatus>((worst, check) => (RANK[check.status] > RANK[worst] ? check.status : worst), 'pass');
  const assumptions = [
    `Loads are q × λ² × C_D·A × (1 + ${yawMargin}) with λ = ${scale}: C_D is taken as equal at model and full scale, and the yaw margin covers yawed attitudes.`,
    `Reynolds numbers are compared at the highest planned speed, ${topSpeed} m/s.`,
  ];
  if (tunnel.kind === 'open-jet') {
    assumptions.push('Blockage thresholds are rules of thumb for closed test sections; an open jet is judged by the same numbers here.');
  }
  return { checks, overall, modelFrontalArea, modelDragArea, loads, assumptions, caution: PLANNER_CAUTION };
}
