import { BaseModel } from '../base-model';

/** Calibration matrices of a balance: `linear` 6×6 and optional `interaction` 6×21, mV/V per load unit. */
export interface CalibrationMatrices {
  linear: number[][];
  interaction?: number[][];
}

/**
 * One version of a balance's calibration. `calibratedOn` and `dueOn` are calendar dates (`YYYY-MM-DD`);
 * a calibration whose due date has passed blocks reductions unless a lab manager records an override.
 */
export class BalanceCalibration extends BaseModel {
  static override tableName = 'balance_calibrations';

  balanceId!: string;
  version!: number;
  matrices!: CalibrationMatrices;
  calibratedOn!: string;
  dueOn!: string;
  enteredBy!: string;

  static override get jsonAttributes(): string[] {
    return ['matrices'];
  }

  /** pg turns a `date` into a Date at local midnight; keep the calendar date it names instead. */
  override $parseDatabaseJson(json: Record<string, unknown>): Record<string, unknown> {
    const parsed = super.$parseDatabaseJson(json);
    for (const key of ['calibratedOn', 'dueOn']) {
      const value = parsed[key];
      if (value instanceof Date) {
        parsed[key] = `${value.getFullYear()}-${String(value.getMonth() + 1).padStart(2, '0')}-${String(value.getDate()).padStart(2, '0')}`;
      }
    }
    return parsed;
  }
}
