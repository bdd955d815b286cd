import { Model, type RelationMappings } from 'objection';
import { BaseModel } from '../base-model';
import { User } from './user';

/**
 * One issued refresh token, stored only as its SHA-256 hash. Tokens rotated from one sign-in share a
 * `familyId`; presenting a token that was already rotated revokes the whole family.
 */
export class RefreshToken extends BaseModel {
  static override tableName = 'refresh_tokens';

  userId!: string;
  tokenHash!: string;
  familyId!: string;
  expiresAt!: Date;
  /** When the token was exchanged for its successor; a second exchange means theft. */
  rotatedAt!: Date | null;
  revokedAt!: Date | null;

  user?: User;

  static override relationMappings = (): RelationMappings => ({
    user: {
      relation: Model.BelongsToOneRelation,
      modelClass: User,
      join: { from: 'refresh_tokens.userId', to: 'users.id' },
    },
  });
}
