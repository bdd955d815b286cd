import { createHash, randomBytes } from 'node:crypto';

/** A fresh random token (32 bytes, base64url) to hand to a client or put in a link. */
export function newToken(): string {
  return randomBytes(32).toString('base64url');
}

/** SHA-256 of a token, hex: the only form in which tokens are stored. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
