import type { Readable } from 'node:stream';

/** What a stored object is known by: its SHA-256 (hex), its size in bytes and its content-addressed key. */
export interface StoredObject {
  sha256: string;
  size: number;
  key: string;
}

/**
 * Immutable, content-addressed storage of raw run files. `put` hashes while streaming, writes to a
 * temporary place and only then moves the bytes under their hash; an existing object is never overwritten.
 */
export interface RawStore {
  /** Stores the stream's bytes and says where they are; storing the same bytes twice gives the same key. */
  put(input: Readable | AsyncIterable<Buffer | Uint8Array> | Iterable<Buffer | Uint8Array>): Promise<StoredObject>;
  /** The bytes stored under `key`; throws `RawObjectMissingError` if there are none. */
  get(key: string): Promise<Readable>;
  /** Whether bytes are stored under `key`. */
  exists(key: string): Promise<boolean>;
}

/** The key of bytes whose SHA-256 is `sha256`: `sha256/ab/cd/abcd…`, so no folder grows too large. */
export function contentKey(sha256: string): string {
  return `sha256/${sha256.slice(0, 2)}/${sha256.slice(2, 4)}/${sha256}`;
}

/** Whether `key` has the form `contentKey` produces (so a key from outside can never escape the store). */
export function isContentKey(key: string): boolean {
  return /^sha256\/[0-9a-f]{2}\/[0-9a-f]{2}\/[0-9a-f]{64}$/.test(key);
}
