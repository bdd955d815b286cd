import { BaseModel } from '../base-model';

/** A saved import profile of the lab; `profile` is the ImportProfile JSON as validated by libs/aero. */
export class ImportProfile extends BaseModel {
  static override tableName = 'import_profiles';

  name!: string;
  description!: string;
  profile!: Record<string, unknown>;
  createdBy!: string;
  /** Whether the profile is withdrawn from new uploads (kept for the reductions that used it). */
  archived!: boolean;

  static override get jsonAttributes(): string[] {
    return ['profile'];
  }
}
