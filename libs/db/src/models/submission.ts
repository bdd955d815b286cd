import type { SubmissionState } from '@tunnelwright/contracts';
import { BaseModel } from '../base-model';

/** A test's chosen reductions (one per run) put forward for approval, and the signatory's decision. */
export class Submission extends BaseModel {
  static override tableName = 'submissions';

  testId!: string;
  sequence!: number;
  state!: SubmissionState;
  note!: string;
  submittedBy!: string;
  decidedBy!: string | null;
  decidedAt!: Date | null;
  decisionReason!: string | null;
}
