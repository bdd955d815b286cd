import { randomBytes } from 'node:crypto';
import argon2 from 'argon2';

/** Hashes a password with argon2id (library defaults: 64 MiB, 3 passes). */
export function hashPassword(password: string): Promise<string> {
  return argon2.hash(password, { type: argon2.argon2id });
}

let dummyHash: Promise<string> | undefined;

/**
 * Verifies `password` against `hash`. Without a hash (unknown e-mail, invitation not accepted) it still
 * verifies against a throw-away hash, so a wrong e-mail costs as long as a wrong password.
 */
export async function verifyPassword(hash: string | null | undefined, password: string): Promise<boolean> {
  if (!hash) {
    dummyHash ??= hashPassword(randomBytes(24).toString('base64url'));
    await argon2.verify(await dummyHash, password).catch(() => false);
    return false;
  }
  try {
    return await argon2.verify(hash, password);
  } catch {
    return false;
  }
}
