import { randomUUID } from 'node:crypto';
import type { CookieOptions, Response } from 'express';
import type { Knex } from 'knex';
import { RefreshToken, User } from '@tunnelwright/db';
import { HttpError } from '../errors/http-error';
import { hashToken, newToken } from './token-hash';

/** Name of the refresh cookie. */
export const refreshCookieName = 'tw_refresh';
/** Lifetime of a refresh token, milliseconds (14 days). */
export const refreshTokenLifetime = 14 * 24 * 60 * 60 * 1000;

function cookieOptions(publicUrl: string): CookieOptions {
  return {
    httpOnly: true,
    sameSite: 'strict',
    path: '/api/auth',
    secure: publicUrl.startsWith('https:'),
  };
}

/** Puts the refresh token into its cookie. */
export function setRefreshCookie(res: Response, publicUrl: string, token: string): void {
  res.cookie(refreshCookieName, token, { ...cookieOptions(publicUrl), maxAge: refreshTokenLifetime });
}

/** Removes the refresh cookie. */
export function clearRefreshCookie(res: Response, publicUrl: string): void {
  res.clearCookie(refreshCookieName, cookieOptions(publicUrl));
}

/** Issues a refresh token for a user, starting a new family unless `familyId` continues one. */
export async function issueRefreshToken(trx: Knex.Transaction | Knex, userId: string, familyId: string = randomUUID()): Promise<string> {
  const token = newToken();
  await RefreshToken.query(trx).insert({
    userId,
    tokenHash: hashToken(token),
    familyId,
    expiresAt: new Date(Date.now() + refreshTokenLifetime),
  });
  return token;
}

const invalidRefresh = () => new HttpError(401, 'Session ended', 'Your session has ended. Please sign in again.');

/**
 * Exchanges a refresh token for its successor in the same family. A token that was already exchanged
 * is treated as stolen: the whole family is revoked and the caller must sign in again.
 */
export async function rotateRefreshToken(knex: Knex, token: string | undefined): Promise<{ user: User; token: string }> {
  if (!token) throw invalidRefresh();
  const outcome = await knex.transaction(async (trx) => {
    const stored = await RefreshToken.query(trx).findOne({ tokenHash: hashToken(token) }).forUpdate();
    if (!stored || stored.revokedAt) return null;
    if (stored.rotatedAt) {
      await RefreshToken.query(trx).patch({ revokedAt: new Date() }).where({ familyId: stored.familyId }).whereNull('revokedAt');
      return 'reused' as const;
    }
    if (stored.expiresAt.getTime() <= Date.now()) return null;
    const user = await User.query(trx).findById(stored.userId).withGraphFetched('organisation');
    if (!user || !user.active || !user.passwordHash) return null;
    await RefreshToken.query(trx).patchAndFetchById(stored.id, { rotatedAt: new Date() });
    const next = await issueRefreshToken(trx, user.id, stored.familyId);
    return { user, token: next };
  });
  if (outcome === null || outcome === 'reused') throw invalidRefresh();
  return outcome;
}

/** Revokes the family of a presented refresh token (sign-out of that session). Unknown tokens are ignored. */
export async function revokeRefreshFamily(knex: Knex, token: string | undefined): Promise<void> {
  if (!token) return;
  const stored = await RefreshToken.query(knex).findOne({ tokenHash: hashToken(token) });
  if (!stored) return;
  await RefreshToken.query(knex).patch({ revokedAt: new Date() }).where({ familyId: stored.familyId }).whereNull('revokedAt');
}

/** Revokes every refresh token of a user (deactivation, password reset). */
export async function revokeAllRefreshTokens(trx: Knex.Transaction | Knex, userId: string): Promise<void> {
  await RefreshToken.query(trx).patch({ revokedAt: new Date() }).where({ userId }).whereNull('revokedAt');
}
