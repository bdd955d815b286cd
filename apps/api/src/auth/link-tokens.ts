import type { Knex } from 'knex';
import { User, UserToken, type UserTokenPurpose } from '@tunnelwright/db';
import { HttpError } from '../errors/http-error';
import { hashToken, newToken } from './token-hash';

/** How long an invitation link works, hours. */
export const invitationValidHours = 72;
/** How long a password-reset link works, minutes. */
export const resetValidMinutes = 60;

const lifetimes: Record<UserTokenPurpose, number> = {
  invitation: invitationValidHours * 60 * 60 * 1000,
  password_reset: resetValidMinutes * 60 * 1000,
};

/** Creates a single-use link token, retiring any earlier unused one of the same purpose for that user. */
export async function createLinkToken(trx: Knex.Transaction, userId: string, purpose: UserTokenPurpose): Promise<{ token: string; expiresAt: Date }> {
  await UserToken.query(trx).patch({ usedAt: new Date() }).where({ userId, purpose }).whereNull('usedAt');
  const token = newToken();
  const expiresAt = new Date(Date.now() + lifetimes[purpose]);
  await UserToken.query(trx).insert({ userId, purpose, tokenHash: hashToken(token), expiresAt });
  return { token, expiresAt };
}

const wording: Record<UserTokenPurpose, { unknown: string; used: string; expired: string }> = {
  invitation: {
    unknown: 'This invitation link is not valid. Check that you copied the whole link.',
    used: 'This invitation has already been used. Sign in with your password, or ask your lab manager for a new invitation.',
    expired: 'This invitation has expired. Ask your lab manager to send a new one.',
  },
  password_reset: {
    unknown: 'This reset link is not valid. Check that you copied the whole link.',
    used: 'This reset link has already been used. Ask for a new one if you still need to change your password.',
    expired: 'This reset link has expired. Ask for a new one.',
  },
};

/**
 * Finds the live token behind a link, with its user and organisation. Unknown → 404; used, expired or
 * belonging to a deactivated user → 410 with a sentence saying which. `lock` takes a row lock for redemption.
 */
export async function findLinkToken(
  knex: Knex | Knex.Transaction,
  token: string,
  purpose: UserTokenPurpose,
  lock = false,
): Promise<{ record: UserToken; user: User }> {
  const words = wording[purpose];
  const query = UserToken.query(knex).findOne({ tokenHash: hashToken(token), purpose });
  const record = await (lock ? query.forUpdate() : query);
  if (!record) throw new HttpError(404, 'Link not found', words.unknown);
  if (record.usedAt) throw new HttpError(410, 'Link already used', words.used);
  if (record.expiresAt.getTime() <= Date.now()) throw new HttpError(410, 'Link expired', words.expired);
  const user = await User.query(knex).findById(record.userId).withGraphFetched('organisation');
  if (!user || !user.active) throw new HttpError(410, 'Account closed', 'This account has been deactivated. Contact your lab manager.');
  if (purpose === 'invitation' && user.passwordHash) throw new HttpError(410, 'Link already used', words.used);
  return { record, user };
}
