import { BaseModel } from '../base-model';

/**
 * One reduced point (set condition) of a reduction. Key figures are columns for querying (yaw and pitch
 * in deg, q in Pa, speed in m/s); `result` holds everything the engine reported for the point.
 */
export class ReductionPoint extends BaseModel {
  static override tableName = 'reduction_points';

  reductionId!: string;
  index!: number;
  pointNumber!: number;
  sampleCount!: number;
  yaw!: number;
  pitch!: number;
  dynamicPressure!: number | null;
  speed!: number | null;
  reynoldsNumber!: number | null;
  cdUncorrected!: number | null;
  cdCorrected!: number | null;
  clCorrected!: number | null;
  csCorrected!: number | null;
  dragCounts!: number | null;
  setpoints!: { yaw: number; pitch: number };
  result!: Record<string, unknown>;

  static override get jsonAttributes(): string[] {
    return ['setpoints', 'result'];
  }
}
