import type { SessionUser, TokenResponse } from '@tunnelwright/contracts';
import type { User } from '@tunnelwright/db';
import { accessTokenLifetime, signAccessToken } from './access-tokens';

/** The signed-in user as the client sees it; `user.organisation` must be loaded. */
export function toSessionUser(user: User): SessionUser {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    organisationId: user.organisationId,
    organisationName: user.organisation?.name ?? '',
  };
}

/** The answer to a successful sign-in, refresh or invitation acceptance. */
export function tokenResponse(secret: string, user: User): TokenResponse {
  return { accessToken: signAccessToken(secret, user), expiresIn: accessTokenLifetime, user: toSessionUser(user) };
}
