import { RefreshToken, UserToken } from '@tunnelwright/db';
import type { Knex } from 'knex';

/** How many rows one purge removed. */
export interface PurgeCounts {
  refreshTokens: number;
  userTokens: number;
}

/**
 * Deletes refresh tokens whose lifetime is over, and single-use link tokens (invitations, password resets)
 * that were used or have run out. Rotated and revoked refresh tokens stay until they expire, because
 * presenting a rotated token must still be recognised as reuse. Running it twice deletes nothing more.
 *
 * @param knex the database to clean
 * @param now the moment that counts as "now" (default: the current time)
 */
export async function purgeExpiredTokens(knex: Knex, now: Date = new Date()): Promise<PurgeCounts> {
  return RefreshToken.transaction(knex, async (trx) => {
    const refreshTokens = await RefreshToken.query(trx).delete().where('expiresAt', '<=', now);
    const userTokens = await UserToken.query(trx)
      .delete()
      .where((builder) => builder.whereNotNull('usedAt').orWhere('expiresAt', '<=', now));
    return { refreshTokens, userTokens };
  });
}
