import type { ReductionState } from '@tunnelwright/contracts';
import { BaseModel } from '../base-model';

/**
 * One version of the reduction of a run's raw file: the engine version, full configuration and input
 * SHA-256 make any figure reproducible. `progress` is a fraction 0–1; a failure keeps its code and location.
 */
export class Reduction extends BaseModel {
  static override tableName = 'reductions';

  runId!: string;
  rawFileId!: string;
  version!: number;
  engineVersion!: string;
  config!: Record<string, unknown>;
  calibrationId!: string | null;
  overrideId!: string | null;
  state!: ReductionState;
  progress!: number;
  errorCode!: string | null;
  errorMessage!: string | null;
  errorLine!: number | null;
  errorColumn!: number | null;
  inputSha256!: string;
  warnings!: unknown[];
  summary!: Record<string, unknown> | null;
  createdBy!: string;
  startedAt!: Date | null;
  finishedAt!: Date | null;
  /** When a submission naming this reduction was approved; from then on the database refuses any change. */
  approvedAt!: Date | null;

  static override get jsonAttributes(): string[] {
    return ['config', 'warnings', 'summary'];
  }
}
