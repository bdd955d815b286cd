/**
 * The per-sample quantities the pipeline accumulates for every point, in the order of the accumulator arrays.
 * Units: angles rad; pressures Pa; temperature K; RH fraction; ρ kg/m³; μ Pa·s; ν m²/s; a, V m/s;
 * loads N and N·m (body axes, about the moment reference centre, zero and tare removed); coefficients 1.
 */
export const SAMPLE_CHANNELS = [
  'yaw',
  'pitch',
  'barometricPressure',
  'temperature',
  'relativeHumidity',
  'density',
  'viscosity',
  'kinematicViscosity',
  'speedOfSound',
  'dynamicPressure',
  'speed',
  'reynoldsNumber',
  'machNumber',
  'axialForce',
  'sideForce',
  'normalForce',
  'rollingMoment',
  'pitchingMoment',
  'yawingMoment',
  'drag',
  'lift',
  'windSideForce',
  'dragCoefficient',
  'liftCoefficient',
  'sideForceCoefficient',
  'rollingMomentCoefficient',
  'pitchingMomentCoefficient',
  'yawingMomentCoefficient',
  'axialForceCoefficient',
] as const;

/** Name of one accumulated per-sample quantity. */
export type SampleChannel = (typeof SAMPLE_CHANNELS)[number];

/** Index of each channel in the accumulator arrays. */
export const CHANNEL_INDEX = Object.freeze(Object.fromEntries(SAMPLE_CHANNELS.map((name, i) => [name, i]))) as Readonly<Record<SampleChannel, number>>;
