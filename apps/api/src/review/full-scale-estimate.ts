import {
  AeroInputError,
  DESIGN_CAUTION,
  CELSIUS_ZERO,
  degreesToRadians,
  fullScaleDragAndPower,
  idealGasDensity,
  ISA_SEA_LEVEL,
  J1252_VEHICLE_SPEED,
  J1252_WIND_SPEED,
  parseReductionConfig,
  radiansToDegrees,
  ReductionConfigError,
  relativeWind,
  reynoldsNumber,
  sutherlandViscosity,
  windAveragedFromYawSweep,
  yawSweepInterpolator,
  type ReductionConfig,
  type YawSweepInterpolator,
  type YawSweepPoint,
} from '@tunnelwright/aero';
import type { FullScaleEstimate, FullScaleInput, PowerAtDirection } from '@tunnelwright/contracts';
import { PointExclusion, Reduction, ReductionPoint } from '@tunnelwright/db';
import { HttpError } from '../errors/http-error';
import { reynoldsRatioNote } from './reynolds-ratio-note';

/** Step of the power-against-wind-direction series, deg. */
const DIRECTION_STEP = 5;

const METHOD =
  'SAE J1252 wind averaging over equally likely wind directions (from memory), on the body-axis C_D of the kept points, linear between yaws; ' +
  'drag ½ρV_r²·C_D(ψ)·λ²S and power drag × ground speed (definitions)';

function reductionConfig(reduction: Reduction): ReductionConfig {
  const { importProfile: _profile, ...engineConfig } = reduction.config as { importProfile?: unknown };
  try {
    return parseReductionConfig(engineConfig, `reduction ${reduction.version} configuration`);
  } catch (error) {
    if (error instanceof ReductionConfigError) {
      throw new HttpError(409, 'Reduction cannot be scaled', 'The stored configuration of this reduction cannot be read, so its scale and reference area are unknown. Reduce the run again.');
    }
    throw error;
  }
}

/** "`fn` requires a yaw sweep …" from the numerics, as a sentence for the analyst. */
function plainReason(error: AeroInputError): string {
  return error.message.replace(/^`\w+` requires /, 'Needs ') + '.';
}

function windAveraged(sweep: readonly YawSweepPoint[], vehicleSpeed: number, windSpeed: number) {
  try {
    return { vehicleSpeed, windSpeed, dragCoefficient: windAveragedFromYawSweep(sweep, { vehicleSpeed, windSpeed }), reason: null };
  } catch (error) {
    if (error instanceof AeroInputError) return { vehicleSpeed, windSpeed, dragCoefficient: null, reason: plainReason(error) };
    throw error;
  }
}

interface FullScaleAir {
  density: number;
  temperature: number;
  pressure: number;
  standard: boolean;
}

/**
 * The full-scale air: ISA sea level when neither temperature nor pressure is entered; otherwise dry air by the
 * ideal-gas law, ρ = p/(R·T) with R = 287.05 J/(kg·K) (common practice), the one left out taken at ISA sea level.
 */
function fullScaleAir(input: FullScaleInput): FullScaleAir {
  if (input.airTemperature === undefined && input.airPressure === undefined) {
    return { density: ISA_SEA_LEVEL.density, temperature: ISA_SEA_LEVEL.temperature, pressure: ISA_SEA_LEVEL.pressure, standard: true };
  }
  const temperature = input.airTemperature === undefined ? ISA_SEA_LEVEL.temperature : input.airTemperature + CELSIUS_ZERO;
  const pressure = input.airPressure === undefined ? ISA_SEA_LEVEL.pressure : input.airPressure * 100;
  return { density: idealGasDensity({ pressure, temperature, relativeHumidity: 0 }), temperature, pressure, standard: false };
}

/** Drag and power at one wind direction, with C_D(ψ) from the sweep; null figures where the sweep does not reach ψ. */
function atDirection(curve: YawSweepInterpolator, area: number, input: FullScaleInput, air: FullScaleAir, windDirection: number): PowerAtDirection & { dragArea: number | null } {
  const wind = relativeWind({ groundSpeed: input.groundSpeed, windSpeed: input.windSpeed, windDirection: degreesToRadians(windDirection) });
  const yawAngle = radiansToDegrees(wind.yawAngle);
  const base = { windDirection, airSpeed: wind.airspeed, yawAngle };
  if (!(Math.abs(wind.yawAngle) <= curve.coveredYawAngle) || Math.abs(wind.yawAngle) >= Math.PI / 2) {
    return { ...base, dragCoefficient: null, dragArea: null, drag: null, power: null };
  }
  const dragCoefficient = curve.dragCoefficientAtYaw(wind.yawAngle);
  const dragArea = dragCoefficient * area;
  if (!(dragArea > 0)) return { ...base, dragCoefficient, dragArea: null, drag: null, power: null };
  const result = fullScaleDragAndPower({ dragArea, density: air.density, groundSpeed: input.groundSpeed, windSpeed: input.windSpeed, windDirection: degreesToRadians(windDirection) });
  return { ...base, dragCoefficient, dragArea, drag: result.drag, power: result.power };
}

/**
 * Full-scale estimate from one finished reduction at a road condition: wind-averaged C_D (SAE J1252 speeds and the
 * entered ones), drag and power at the entered wind, power against wind direction, and the model-to-full-scale
 * Reynolds-number ratio with a note. Full-scale air is ISA sea level, or dry air at an entered temperature and pressure.
 * Excluded points are left out.
 *
 * @param reductionId - a finished reduction
 * @param input - ground speed (m/s), wind speed (m/s), wind direction (deg, 0 = head wind), optional air temperature
 *   (°C) and pressure (hPa)
 * @throws HttpError 404 unknown reduction; 409 not finished, no kept points, or stored without the engine's full result;
 *   400 on `windSpeed` when the wind overtakes the vehicle from behind
 */
export async function fullScaleEstimate(reductionId: string, input: FullScaleInput): Promise<FullScaleEstimate> {
  const reduction = await Reduction.query().findById(reductionId);
  if (!reduction) throw HttpError.notFound('The reduction');
  if (reduction.state !== 'done') throw new HttpError(409, 'Reduction not finished', `This reduction is ${reduction.state}; a full-scale estimate needs a finished one.`);
  const config = reductionConfig(reduction);
  const excluded = new Set((await PointExclusion.query().where('reductionId', reduction.id).select('pointIndex')).map((e) => e.pointIndex));
  const points = (await ReductionPoint.query().where('reductionId', reduction.id).orderBy('index')).filter((p) => !excluded.has(p.index));
  if (points.length === 0) throw new HttpError(409, 'No points to scale', 'Every point of this reduction is excluded, or it has none.');

  const sweep: YawSweepPoint[] = points.map((p) => {
    const axial = (p.result as { corrected?: { axialForceCoefficient?: { value?: unknown } } }).corrected?.axialForceCoefficient?.value;
    if (typeof axial !== 'number' || !Number.isFinite(axial)) {
      throw new HttpError(409, 'Reduction cannot be scaled', `Point ${p.pointNumber} was stored without the engine's body-axis drag coefficient. Reduce the run again.`);
    }
    return { yawAngle: degreesToRadians(p.yaw), dragCoefficient: axial };
  });
  const curve = yawSweepInterpolator(sweep);
  const { scale, referenceArea, referenceLength } = config.article;
  const area = referenceArea * scale * scale;

  const wind = relativeWind({ groundSpeed: input.groundSpeed, windSpeed: input.windSpeed, windDirection: degreesToRadians(input.windDirection) });
  if (wind.airspeed === 0 || Math.abs(wind.yawAngle) >= Math.PI / 2) {
    throw HttpError.field('windSpeed', 'At this wind the air reaches the vehicle from behind or not at all; enter a wind speed below the ground speed for a tail wind.');
  }
  const air = fullScaleAir(input);
  const condition = atDirection(curve, area, input, air, input.windDirection);
  const covered = radiansToDegrees(Math.max(curve.coveredYawAngle, 0)).toFixed(1);
  const conditionReason =
    condition.power === null ? `The kept points cover yaw 0° to ±${covered}°; this wind meets the vehicle at ${Math.abs(condition.yawAngle).toFixed(1)}°.` : null;

  const powerByDirection: PowerAtDirection[] = [];
  for (let direction = 0; direction <= 360; direction += DIRECTION_STEP) {
    const { dragArea: _area, ...row } = atDirection(curve, area, input, air, direction);
    powerByDirection.push(row);
  }

  const reynolds = points.map((p) => p.reynoldsNumber).filter((re): re is number => re !== null && Number.isFinite(re) && re > 0);
  if (reynolds.length === 0) throw new HttpError(409, 'Reduction cannot be scaled', 'No kept point has a Reynolds number.');
  const modelReynoldsNumber = reynolds.reduce((sum, re) => sum + re, 0) / reynolds.length;
  const fullScaleReynoldsNumber = reynoldsNumber(air.density, wind.airspeed, referenceLength * scale, sutherlandViscosity(air.temperature));
  const ratio = modelReynoldsNumber / fullScaleReynoldsNumber;

  return {
    reductionId: reduction.id,
    input,
    air,
    scale,
    referenceArea: area,
    windAveraged: { standard: windAveraged(sweep, J1252_VEHICLE_SPEED, J1252_WIND_SPEED), atCondition: windAveraged(sweep, input.groundSpeed, input.windSpeed), method: METHOD },
    condition: { ...condition, reason: conditionReason },
    powerByDirection,
    reynoldsNumberRatio: { modelReynoldsNumber, fullScaleReynoldsNumber, ratio, note: reynoldsRatioNote(ratio) },
    excludedPoints: excluded.size,
    caution: DESIGN_CAUTION,
  };
}
