import {
  AeroInputError,
  buildUpDrag,
  compareWithMeasured,
  estimateDuration,
  findShape,
  fullScalePower,
  headTailPowerSeries,
  PLANNER_CAUTION,
  tunnelFit,
  type PlannerPart,
  type ShapeEntry,
} from '@tunnelwright/aero';
import type { PlanEvaluation, PlanInput, PlanShapeDimensions } from '@tunnelwright/contracts';
import { Balance, isStaff, Tunnel, type Caller } from '@tunnelwright/db';
import { HttpError } from '../errors/http-error';

/** Number of points on the head- versus tail-wind chart, from still air to the chart's wind range. */
const SERIES_POINTS = 11;

const degrees = (radians: number): number => (radians * 180) / Math.PI;
const radians = (deg: number): number => (deg * Math.PI) / 180;

/** A saved plan's measured value (full-scale C_D·A, m², with U at k = 2) and where it comes from. */
export interface MeasuredValue {
  dragArea: number;
  expandedUncertainty: number | null;
  source: string | null;
}

function shapeEntryFor(part: { shapeId: string; orientation?: string | undefined }, field: string): ShapeEntry {
  try {
    return findShape(part.shapeId, part.orientation);
  } catch (error) {
    if (error instanceof AeroInputError) throw HttpError.field(`${field}.shapeId`, 'Choose a shape from the library');
    throw error;
  }
}

/** The dimensions an entry reads, so a missing one is named before the numerics refuse it. */
function requiredDimensions(entry: ShapeEntry): (keyof PlanShapeDimensions)[] {
  const names = new Set<keyof PlanShapeDimensions>(entry.referenceArea.dimensions);
  for (const name of entry.frontalArea?.dimensions ?? []) names.add(name);
  if (entry.characteristicLength) names.add(entry.characteristicLength.dimension);
  // Whole objects fall back on the typical area their source gives.
  if (entry.kind === 'object' && entry.typicalFrontalArea !== undefined) names.delete('frontalArea');
  return [...names];
}

/** Library parts and custom parts as the numerics take them, each checked for the dimensions its shape reads. */
function toPlannerParts(input: PlanInput, prefix: string): PlannerPart[] {
  return input.parts.map((part, index) => {
    const field = `${prefix}parts.${index}`;
    if (part.type === 'custom') {
      return { label: part.label, dragArea: part.dragArea, count: part.count, ...(part.frontalArea === undefined ? {} : { frontalArea: part.frontalArea }) };
    }
    const entry = shapeEntryFor(part, field);
    for (const name of requiredDimensions(entry)) {
      if (part.dimensions[name] === undefined) {
        throw HttpError.field(`${field}.dimensions.${name}`, `${entry.label} needs its ${name === 'frontalArea' ? 'frontal area (m²)' : `${name} (m)`}`);
      }
    }
    return {
      shapeId: entry.id,
      dimensions: part.dimensions,
      count: part.count,
      ...(part.label ? { label: part.label } : {}),
    };
  });
}

async function plannedTunnel(input: PlanInput, caller: Caller, prefix: string) {
  const tunnel = await Tunnel.query().findById(input.tunnelId);
  // Customers only ever plan against the live catalogue.
  if (!tunnel || (tunnel.archivedAt && !isStaff(caller))) throw HttpError.field(`${prefix}tunnelId`, 'Choose a tunnel from the catalogue');
  if (input.dragCapacity !== undefined) {
    return { tunnel, dragCapacity: input.dragCapacity, capacitySource: 'request' as const, balanceIdentifier: null };
  }
  if (input.balanceId === undefined) {
    throw HttpError.field(`${prefix}dragCapacity`, 'Enter the balance drag capacity (N) or choose a balance');
  }
  const balance = await Balance.query().findById(input.balanceId);
  const fx = balance?.capacities[0];
  if (!balance || fx === undefined || !(fx > 0)) throw HttpError.field(`${prefix}balanceId`, 'Choose a balance with a drag (Fx) capacity');
  return { tunnel, dragCapacity: fx, capacitySource: 'balance' as const, balanceIdentifier: balance.identifier };
}

function fullScaleCase(input: PlanInput, dragArea: number, prefix: string) {
  const { groundSpeed, windSpeed, windDirection } = input.fullScale;
  try {
    const power = fullScalePower({ dragArea, density: input.air.density, groundSpeed, windSpeed, windDirection: radians(windDirection) });
    return { groundSpeed, windSpeed, windDirection, airspeed: power.airspeed, yaw: degrees(power.yawAngle), drag: power.drag, power: power.power };
  } catch (error) {
    if (error instanceof AeroInputError) {
      throw HttpError.field(`${prefix}fullScale.windSpeed`, 'This wind overtakes the vehicle; a constant drag area does not apply. Lower the wind or turn it ahead of the vehicle.');
    }
    throw error;
  }
}

/**
 * Evaluates a plan: full-scale build-up at the ground speed in still air, fit against the chosen tunnel at scale λ
 * with the balance drag capacity from the request or a balance, full-scale power in the stated wind, a head- versus
 * tail-wind series, tunnel hours, and the comparison with a measured drag area when one is known.
 * `prefix` is prepended to field names in 400 answers (`input.` for saves). A saved plan passes its own `measured`
 * (null when nothing is linked), so a number typed into a stored input never stands in for a certified value.
 */
export async function evaluatePlan(input: PlanInput, caller: Caller, options: { prefix?: string; measured?: MeasuredValue | null } = {}): Promise<PlanEvaluation> {
  const prefix = options.prefix ?? '';
  const parts = toPlannerParts(input, prefix);
  const { tunnel, dragCapacity, capacitySource, balanceIdentifier } = await plannedTunnel(input, caller, prefix);
  try {
    const buildUp = buildUpDrag(parts, {
      speed: input.fullScale.groundSpeed,
      density: input.air.density,
      viscosity: input.air.viscosity,
      interferenceFactor: input.interferenceFactor,
    });
    const fit = tunnelFit({
      buildUp,
      tunnel: {
        kind: tunnel.kind === 'open_jet' ? 'open-jet' : 'closed-section',
        sectionArea: tunnel.area,
        maxSpeed: tunnel.maxSpeed,
        capacities: { drag: dragCapacity },
        density: input.air.density,
        viscosity: input.air.viscosity,
      },
      scale: input.scale,
      speeds: input.speeds,
      yawMargin: input.yawMargin,
    });
    const fullScale = fullScaleCase(input, buildUp.totalDragArea, prefix);
    const step = input.fullScale.seriesMaxWind / (SERIES_POINTS - 1);
    const series = headTailPowerSeries({
      dragArea: buildUp.totalDragArea,
      density: input.air.density,
      groundSpeed: input.fullScale.groundSpeed,
      windSpeeds: Array.from({ length: SERIES_POINTS }, (_, i) => i * step),
    });
    const duration = estimateDuration(input.duration);
    const typed = input.measuredDragArea === undefined ? null : { dragArea: input.measuredDragArea, expandedUncertainty: null, source: null };
    const measuredValue = options.measured !== undefined ? options.measured : typed;
    const measured = measuredValue
      ? {
          ...measuredValue,
          estimatedDragArea: buildUp.totalDragArea,
          differencePercent: compareWithMeasured(buildUp.totalDragArea, measuredValue.dragArea).differencePercent,
        }
      : null;
    return {
      caution: PLANNER_CAUTION,
      buildUp: {
        parts: buildUp.parts,
        speed: buildUp.speed,
        density: buildUp.density,
        viscosity: buildUp.viscosity,
        dynamicPressure: buildUp.dynamicPressure,
        interferenceFactor: buildUp.interferenceFactor,
        sumDragArea: buildUp.sumDragArea,
        totalDragArea: buildUp.totalDragArea,
        totalDrag: buildUp.totalDrag,
        assumptions: buildUp.assumptions,
      },
      tunnel: { id: tunnel.id, name: tunnel.name, kind: tunnel.kind, sectionArea: tunnel.area, maxSpeed: tunnel.maxSpeed, dragCapacity, capacitySource, balanceIdentifier },
      fit: { checks: fit.checks, overall: fit.overall, modelFrontalArea: fit.modelFrontalArea, modelDragArea: fit.modelDragArea, loads: fit.loads, assumptions: fit.assumptions },
      fullScale,
      powerSeries: series.points,
      duration: { hours: duration.hours, pointHours: duration.pointHours, changeHours: duration.changeHours, setupHours: duration.setupHours },
      measured,
    };
  } catch (error) {
    // The schema already bounds every number; what is left is a combination the numerics refuse, said in their words.
    if (error instanceof AeroInputError) throw new HttpError(400, 'The plan cannot be evaluated', error.message.replace(/`/g, ''));
    throw error;
  }
}
