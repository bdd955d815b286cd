import type { Role } from '@tunnelwright/contracts';
import jwt from 'jsonwebtoken';

/** Lifetime of an access token, seconds. */
export const accessTokenLifetime = 15 * 60;

/** Claims inside an access token. */
export interface AccessClaims {
  sub: string;
  role: Role;
  org: string;
}

/** Signs a short-lived HS256 access token for a user. */
export function signAccessToken(secret: string, user: { id: string; role: Role; organisationId: string }): string {
  const claims: AccessClaims = { sub: user.id, role: user.role, org: user.organisationId };
  return jwt.sign(claims, secret, { algorithm: 'HS256', expiresIn: accessTokenLifetime });
}
