import { BaseModel } from '../base-model';

/** A lab manager's recorded decision that one test may be reduced with an overdue calibration. */
export class CalibrationOverride extends BaseModel {
  static override tableName = 'calibration_overrides';

  testId!: string;
  calibrationId!: string;
  grantedBy!: string;
  reason!: string;
}
