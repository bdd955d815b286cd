import { createHash, timingSafeEqual } from 'node:crypto';

/** SHA-256 of an issued file, lower-case hex: recorded at issue and published on the verification page. */
export function sha256Hex(buffer: Uint8Array): string {
  return createHash('sha256').update(buffer).digest('hex');
}

/**
 * Whether a file is byte for byte the one issued.
 *
 * @param buffer - the file as presented
 * @param expectedSha256 - the hash recorded at issue (hex, either case)
 */
export function verifyIssuedFile(buffer: Uint8Array, expectedSha256: string): boolean {
  if (!/^[0-9a-fA-F]{64}$/.test(expectedSha256)) return false;
  return timingSafeEqual(Buffer.from(sha256Hex(buffer), 'hex'), Buffer.from(expectedSha256, 'hex'));
}
