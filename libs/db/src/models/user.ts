import type { Role } from '@tunnelwright/contracts';
import { Model, type RelationMappings } from 'objection';
import { BaseModel } from '../base-model';
import { Organisation } from './organisation';

/** A person who signs in. `passwordHash` (argon2id) stays null until the invitation is accepted. */
export class User extends BaseModel {
  static override tableName = 'users';

  email!: string;
  name!: string;
  role!: Role;
  organisationId!: string;
  passwordHash!: string | null;
  active!: boolean;

  organisation?: Organisation;

  static override relationMappings = (): RelationMappings => ({
    organisation: {
      relation: Model.BelongsToOneRelation,
      modelClass: Organisation,
      join: { from: 'users.organisationId', to: 'organisations.id' },
    },
  });

  /** Never serialise the password hash, whatever the caller does with the model. */
  override $formatJson(json: Record<string, unknown>): Record<string, unknown> {
    const formatted = super.$formatJson(json);
    delete formatted['passwordHash'];
    return formatted;
  }
}
