import type { ResultSheetState } from '@tunnelwright/contracts';
import { BaseModel } from '../base-model';

/**
 * An issued certified result sheet: the PDF bytes, their SHA-256 and what the sheet states. Never changed or
 * deleted; a correction issues the next revision and marks this one superseded.
 */
export class ResultSheet extends BaseModel {
  static override tableName = 'result_sheets';

  testId!: string;
  submissionId!: string;
  series!: string;
  revision!: number;
  reportNumber!: string;
  state!: ResultSheetState;
  revisionReason!: string | null;
  supersedesId!: string | null;
  supersededById!: string | null;
  supersededAt!: Date | null;
  issueDate!: string;
  issuedBy!: string;
  authorisedBy!: string;
  sha256!: string;
  size!: number;
  pdf!: Buffer;
  pageCount!: number;
  data!: Record<string, unknown>;

  static override get jsonAttributes(): string[] {
    return ['data'];
  }

  /** pg turns a `date` into a Date at local midnight; keep the calendar date it names instead. */
  override $parseDatabaseJson(json: Record<string, unknown>): Record<string, unknown> {
    const parsed = super.$parseDatabaseJson(json);
    const value = parsed['issueDate'];
    if (value instanceof Date) {
      parsed['issueDate'] = `${value.getFullYear()}-${String(value.getMonth() + 1).padStart(2, '0')}-${String(value.getDate()).padStart(2, '0')}`;
    }
    return parsed;
  }
}
