/**
 * One data row of a run file, converted to SI units.
 *
 * The reader REUSES one `RunSample` object (and its two `Float64Array`s) for every row, so that reading
 * a million rows allocates nothing per row. A consumer must copy every value it keeps beyond the
 * `onSample` callback (for example `Float64Array.from(sample.loads)`).
 */
export interface RunSample {
  /** 1-based line number of the row in the file. */
  line: number;
  /** Time since start of run, s; NaN if the file has no time column. */
  time: number;
  /** Integer set-condition number; rows sharing it belong to one set condition. */
  point: number;
  /** Yaw angle, rad. */
  yaw: number;
  /** Pitch angle, rad. */
  pitch: number;
  /** Dynamic pressure q, Pa; NaN when the file gives a reference pressure difference instead. */
  dynamicPressure: number;
  /** Reference pressure difference Δp_ref, Pa; NaN when q is given. */
  referencePressureDifference: number;
  /** Barometric pressure, Pa. */
  barometricPressure: number;
  /** Air temperature, K. */
  temperature: number;
  /** Relative humidity as a fraction 0..1. */
  relativeHumidity: number;
  /** Informational test-section speed, m/s; NaN if the file has no `V` column. */
  speed: number;
  /** Fx, Fy, Fz [N], Mx, My, Mz [N·m] in balance axes; NaN-filled when the file gives bridge outputs. */
  loads: Float64Array;
  /** Bridge outputs R1…R6 [mV/V]; NaN-filled when the file gives loads. */
  bridges: Float64Array;
}

/**
 * Creates a NaN-filled sample, the one object the reader reuses for every row.
 * @returns a sample with every number NaN and both arrays of length 6 filled with NaN
 */
export function createRunSample(): RunSample {
  return {
    line: 0,
    time: NaN,
    point: NaN,
    yaw: NaN,
    pitch: NaN,
    dynamicPressure: NaN,
    referencePressureDifference: NaN,
    barometricPressure: NaN,
    temperature: NaN,
    relativeHumidity: NaN,
    speed: NaN,
    loads: new Float64Array(6).fill(NaN),
    bridges: new Float64Array(6).fill(NaN),
  };
}
