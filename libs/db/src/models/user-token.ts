import { Model, type RelationMappings } from 'objection';
import { BaseModel } from '../base-model';
import { User } from './user';

export type UserTokenPurpose = 'invitation' | 'password_reset';

/** A single-use link token (invitation or password reset), stored only as its SHA-256 hash. */
export class UserToken extends BaseModel {
  static override tableName = 'user_tokens';

  userId!: string;
  purpose!: UserTokenPurpose;
  tokenHash!: string;
  expiresAt!: Date;
  usedAt!: Date | null;

  user?: User;

  static override relationMappings = (): RelationMappings => ({
    user: {
      relation: Model.BelongsToOneRelation,
      modelClass: User,
      join: { from: 'user_tokens.userId', to: 'users.id' },
    },
  });
}
