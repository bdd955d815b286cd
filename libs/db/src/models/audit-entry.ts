import { Model, type RelationMappings } from 'objection';
import { BaseModel } from '../base-model';
import { User } from './user';

/** One change of consequence: who did what to which record, with the record before and after. */
export class AuditEntry extends BaseModel {
  static override tableName = 'audit_entries';

  actorId!: string | null;
  action!: string;
  entity!: string;
  entityId!: string | null;
  before!: unknown;
  after!: unknown;

  actor?: User;

  static override get jsonAttributes(): string[] {
    return ['before', 'after'];
  }

  static override relationMappings = (): RelationMappings => ({
    actor: {
      relation: Model.BelongsToOneRelation,
      modelClass: User,
      join: { from: 'audit_entries.actorId', to: 'users.id' },
    },
  });
}
