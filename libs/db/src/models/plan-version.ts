import { BaseModel } from '../base-model';

/** One immutable save of a plan: the validated planner input as JSON (SI units) and a note on what changed. */
export class PlanVersion extends BaseModel {
  static override tableName = 'plan_versions';

  planId!: string;
  version!: number;
  input!: Record<string, unknown>;
  note!: string;
  createdBy!: string;

  static override get jsonAttributes(): string[] {
    return ['input'];
  }
}
