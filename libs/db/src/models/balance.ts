import { Model, type RelationMappings } from 'objection';
import { BaseModel } from '../base-model';
import { BalanceCalibration } from './balance-calibration';

/** A six-component balance; `capacities` are Fx, Fy, Fz in N and Mx, My, Mz in N·m. */
export class Balance extends BaseModel {
  static override tableName = 'balances';

  identifier!: string;
  description!: string;
  capacities!: number[];
  /** Tunnel the balance is installed in, if any. */
  tunnelId!: string | null;

  calibrations?: BalanceCalibration[];

  static override get jsonAttributes(): string[] {
    return ['capacities'];
  }

  static override relationMappings = (): RelationMappings => ({
    calibrations: {
      relation: Model.HasManyRelation,
      modelClass: BalanceCalibration,
      join: { from: 'balances.id', to: 'balance_calibrations.balanceId' },
    },
  });
}
