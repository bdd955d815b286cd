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

/**
 * Index of each channel in the accumulator arrays. Written out as a literal (not built from the list) so
 * that the engine keeps it a fast-property object in the per-sample path; a spec checks it matches the list.
 */
export const CHANNEL_INDEX = Object.freeze({
  yaw: 0,
  pitch: 1,
  barometricPressure: 2,
  temperature: 3,
  relativeHumidity: 4,
  density: 5,
  viscosity: 6,
  kinematicViscosity: 7,
  speedOfSound: 8,
  dynamicPressure: 9,
  speed: 10,
  reynoldsNumber: 11,
  machNumber: 12,
  axialForce: 13,
  sideForce: 14,
  normalForce: 15,
  rollingMoment: 16,
  pitchingMoment: 17,
  yawingMoment: 18,
  drag: 19,
  lift: 20,
  windSideForce: 21,
  dragCoefficient: 22,
  liftCoefficient: 23,
  sideForceCoefficient: 24,
  rollingMomentCoefficient: 25,
  pitchingMomentCoefficient: 26,
  yawingMomentCoefficient: 27,
  axialForceCoefficient: 28,
}) satisfies Readonly<Record<SampleChannel, number>>;
