import type { OrganisationKind } from '@tunnelwright/contracts';
import { Model, type RelationMappings } from 'objection';
import { BaseModel } from '../base-model';
import { User } from './user';

/** Settings the lab keeps on its own organisation row. */
export interface LabSettings {
  /** ISO 4217 code used when a service names none. */
  defaultCurrency?: string;
  [key: string]: unknown;
}

/** The laboratory itself (exactly one, kind `lab`) or a customer firm (kind `customer`). */
export class Organisation extends BaseModel {
  static override tableName = 'organisations';

  name!: string;
  kind!: OrganisationKind;
  /** IANA time zone for display, e.g. `Europe/London`; set on the lab. */
  timeZone!: string | null;
  settings!: LabSettings;

  users?: User[];

  static override get jsonAttributes(): string[] {
    return ['settings'];
  }

  static override relationMappings = (): RelationMappings => ({
    users: {
      relation: Model.HasManyRelation,
      modelClass: User,
      join: { from: 'organisations.id', to: 'users.organisationId' },
    },
  });
}
