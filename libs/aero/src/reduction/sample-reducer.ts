import { airDensity, isWithinCipmValidity, kinematicViscosity, speedOfSound, sutherlandViscosity } from '../air';
import { bodyToWindAxes, sideslipFromYaw } from '../axes';
import { BalanceCalibration, BalanceConvergenceError, interpolateTare, transferMoments, type TareTable } from '../balance';
import type { ReductionConfig } from '../config';
import { AeroInputError } from '../errors';
import { machNumber, reynoldsNumber, speedFromDynamicPressure } from '../flow';
import type { RunFileHeader, RunSample } from '../run-file';
import { degreesToRadians } from '../units';
import { ReductionError, type ReductionErrorCode } from './reduction-error';
import { CHANNEL_INDEX as C, SAMPLE_CHANNELS } from './sample-channels';

/**
 * Turns one run-file sample into every per-sample quantity of `SAMPLE_CHANNELS`: air properties, q, V, Re,
 * Mach, loads (calibrated, zero and tare removed, moved to the moment centre), wind-axis forces and
 * uncorrected coefficients. Holds all scratch arrays, so reducing a sample allocates nothing.
 */
export class SampleReducer {
  /** Values of the last sample, indexed by `CHANNEL_INDEX`. */
  readonly values = new Float64Array(SAMPLE_CHANNELS.length);
  /** Whether the last sample's air state lay outside the CIPM-2007 range (only with that model). */
  outsideCipmValidity = false;
  /** Whether a component of the last sample exceeded its capacity. */
  overCapacity = false;

  private readonly calibration: BalanceCalibration | undefined;
  private readonly qFactor: number;
  private readonly tare: TareTable | undefined;
  private readonly loads = new Float64Array(6);
  private readonly bridges = new Float64Array(6);
  private readonly tareLoads = new Float64Array(6);
  private tareYaw = NaN;
  private tarePitch = NaN;
  private readonly wind = new Float64Array(3);
  private readonly airState = { pressure: NaN, temperature: NaN, relativeHumidity: NaN };
  private density = NaN;
  private viscosity = NaN;
  private soundSpeed = NaN;
  private kinematic = NaN;

  /**
   * @param config - the parsed configuration
   * @param header - the run file's header
   * @throws {ReductionError} `MISSING_CALIBRATION` or `MISSING_Q_FACTOR` when the file needs what the configuration lacks
   */
  constructor(
    private readonly config: ReductionConfig,
    private readonly header: RunFileHeader,
  ) {
    const calibration = config.balance.calibration;
    if (header.loadKind === 'bridges') {
      if (!calibration) {
        throw new ReductionError('MISSING_CALIBRATION', 'MISSING_CALIBRATION the file gives bridge outputs (R1…R6) but the configuration has no balance.calibration', header.fileName, header.headerLine, 1);
      }
      try {
        this.calibration = new BalanceCalibration(calibration);
      } catch (error) {
        throw new ReductionError('BAD_VALUE', `BAD_VALUE balance.calibration: ${(error as Error).message}`, header.fileName, header.headerLine, 1);
      }
    }
    const fileFactor = header.metadata['q_factor'] === undefined ? NaN : Number(header.metadata['q_factor']);
    this.qFactor = config.qFactor ?? fileFactor;
    if (header.pressureKind === 'reference' && !(this.qFactor > 0)) {
      throw new ReductionError('MISSING_Q_FACTOR', 'MISSING_Q_FACTOR the file gives dp_ref but neither a "# q_factor:" line nor the configuration\'s qFactor', header.fileName, header.headerLine, 1);
    }
    const tare = config.zeros.tare;
    if (tare) this.tare = { yaw: tare.yaw.map(degreesToRadians), pitch: tare.pitch.map(degreesToRadians), loads: tare.loads };
  }

  /** The q factor in use (NaN when the file gives q directly). */
  get dynamicPressureFactor(): number {
    return this.header.pressureKind === 'reference' ? this.qFactor : NaN;
  }

  /**
   * Reduces one sample into `values`.
   * @param sample - the reader's (reused) sample
   * @throws {ReductionError} `ZERO_WIND`, `NOT_CONVERGED`, `NOT_COVERED` or `BAD_VALUE`, located at the sample's line
   */
  reduce(sample: RunSample): void {
    try {
      this.compute(sample);
    } catch (error) {
      throw this.locate(error, sample.line);
    }
  }

  private compute(sample: RunSample): void {
    const { config, values: v, loads, wind } = this;
    const { article } = config;
    const air = this.airState;
    if (sample.barometricPressure !== air.pressure || sample.temperature !== air.temperature || sample.relativeHumidity !== air.relativeHumidity) {
      // The air state changes slowly; recompute the air properties only when it changes.
      air.pressure = sample.barometricPressure;
      air.temperature = sample.temperature;
      air.relativeHumidity = sample.relativeHumidity;
      this.density = airDensity(config.densityModel, air);
      this.viscosity = sutherlandViscosity(air.temperature);
      this.soundSpeed = speedOfSound(air.temperature);
      this.kinematic = kinematicViscosity(this.viscosity, this.density);
      this.outsideCipmValidity = config.densityModel === 'cipm-2007' && !isWithinCipmValidity(air);
    }
    const rho = this.density;
    const mu = this.viscosity;
    const q = this.header.pressureKind === 'reference' ? this.qFactor * sample.referencePressureDifference : sample.dynamicPressure;
    const speed = speedFromDynamicPressure(q, rho);
    v[C.yaw] = sample.yaw;
    v[C.pitch] = sample.pitch;
    v[C.barometricPressure] = air.pressure;
    v[C.temperature] = air.temperature;
    v[C.relativeHumidity] = air.relativeHumidity;
    v[C.density] = rho;
    v[C.viscosity] = mu;
    v[C.kinematicViscosity] = this.kinematic;
    v[C.speedOfSound] = this.soundSpeed;
    v[C.dynamicPressure] = q;
    v[C.speed] = speed;
    v[C.reynoldsNumber] = reynoldsNumber(rho, speed, article.referenceLength, mu);
    v[C.machNumber] = machNumber(speed, this.soundSpeed);

    this.balanceLoads(sample);
    transferMoments(loads, config.balance.centreOffset);
    for (let i = 0; i < 6; i++) v[C.axialForce + i] = loads[i];
    bodyToWindAxes(loads[0], loads[2], loads[1], sample.pitch, sideslipFromYaw(sample.yaw), wind);
    v[C.drag] = wind[0];
    v[C.lift] = wind[1];
    v[C.windSideForce] = wind[2];
    const qs = q * article.referenceArea;
    const qsl = qs * article.referenceLength;
    v[C.dragCoefficient] = wind[0] / qs;
    v[C.liftCoefficient] = wind[1] / qs;
    v[C.sideForceCoefficient] = wind[2] / qs;
    v[C.rollingMomentCoefficient] = loads[3] / qsl;
    v[C.pitchingMomentCoefficient] = loads[4] / qsl;
    v[C.yawingMomentCoefficient] = loads[5] / qsl;
    v[C.axialForceCoefficient] = loads[0] / qs;
  }

  /** Balance-axis loads with the wind-off zero and the weight tare removed, into `this.loads`. */
  private balanceLoads(sample: RunSample): void {
    const { config, loads } = this;
    const zeros = config.zeros;
    if (this.calibration) {
      const bridges = this.bridges;
      for (let i = 0; i < 6; i++) bridges[i] = sample.bridges[i] - zeros.bridges[i];
      this.calibration.loadsFromBridges(bridges, loads);
    } else {
      for (let i = 0; i < 6; i++) loads[i] = sample.loads[i] - zeros.loads[i];
    }
    const capacities = config.balance.capacities;
    let over = false;
    if (capacities) for (let i = 0; i < 6; i++) if (Math.abs(loads[i]) > capacities[i]) over = true;
    this.overCapacity = over;
    if (this.tare) {
      if (sample.yaw !== this.tareYaw || sample.pitch !== this.tarePitch) {
        // Setpoints hold still within a point, so the tare is looked up only when the attitude changes.
        interpolateTare(this.tare, sample.yaw, sample.pitch, this.tareLoads);
        this.tareYaw = sample.yaw;
        this.tarePitch = sample.pitch;
      }
      for (let i = 0; i < 6; i++) loads[i] -= this.tareLoads[i];
    }
  }

  private locate(error: unknown, line: number): unknown {
    const fileName = this.header.fileName;
    if (error instanceof BalanceConvergenceError) return new ReductionError('NOT_CONVERGED', `NOT_CONVERGED ${error.message}`, fileName, line, 1);
    if (error instanceof AeroInputError) {
      const code: ReductionErrorCode = error.code === 'ZERO_WIND' ? 'ZERO_WIND' : error.code === 'NOT_COVERED' ? 'NOT_COVERED' : 'BAD_VALUE';
      return new ReductionError(code, `${code} ${error.message}`, fileName, line, 1);
    }
    return error;
  }
}
