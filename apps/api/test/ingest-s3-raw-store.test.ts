import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Readable } from 'node:stream';
import { contentKey, createRawStore, RawObjectMissingError, S3RawStore } from '@tunnelwright/db';
import S3rver from 's3rver';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sha256 } from './support/ingest-world';

async function bytesOf(stream: Readable): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(Buffer.from(chunk as Buffer));
  return Buffer.concat(chunks);
}

/** A stream of `total` bytes in uneven chunks, like a socket delivers them. */
function chunked(bytes: Buffer): Readable {
  const sizes = [1, 7, 65_536, 3, 1_048_577];
  let offset = 0;
  let i = 0;
  return new Readable({
    read() {
      if (offset >= bytes.length) return void this.push(null);
      const size = sizes[i++ % sizes.length] ?? 1;
      this.push(bytes.subarray(offset, offset + size));
      offset += size;
    },
  });
}

describe('S3 raw store against s3rver on loopback', () => {
  let server: S3rver;
  let directory: string;
  let store: S3RawStore;

  beforeAll(async () => {
    directory = mkdtempSync(join(tmpdir(), 'tw-s3rver-'));
    server = new S3rver({ address: '127.0.0.1', port: 0, silent: true, directory, configureBuckets: [{ name: 'raw-files' }] });
    const { port } = await server.run();
    store = createRawStore({ RAW_STORE: 's3', S3_BUCKET: 'raw-files', S3_ENDPOINT: `http://127.0.0.1:${port}`, S3_REGION: 'us-east-1', S3_ACCESS_KEY_ID: 'S3RVER', S3_SECRET_ACCESS_KEY: 'S3RVER' }) as S3RawStore;
  });
  afterAll(async () => {
    await store?.close();
    await server?.close();
    rmSync(directory, { recursive: true, force: true });
  });

  it('put streams (multipart above 5 MB) and stores exactly the bytes under their SHA-256', async () => {
    const bytes = randomBytes(12 * 1024 * 1024 + 13);
    const stored = await store.put(chunked(bytes));
    expect(stored).toEqual({ sha256: sha256(bytes), size: bytes.length, key: contentKey(sha256(bytes)) });
    expect(await store.exists(stored.key)).toBe(true);
    expect(sha256(await bytesOf(await store.get(stored.key)))).toBe(sha256(bytes));
  });

  it('storing the same bytes again gives the same key and leaves the first copy', async () => {
    const bytes = Buffer.from('time [s], point\n1, 1\n');
    const first = await store.put(Readable.from([bytes]));
    const second = await store.put(Readable.from([bytes]));
    expect(second.key).toBe(first.key);
    expect(await bytesOf(await store.get(first.key))).toEqual(bytes);
  });

  it('an empty file is stored too', async () => {
    const stored = await store.put(Readable.from([]));
    expect(stored.size).toBe(0);
    expect((await bytesOf(await store.get(stored.key))).length).toBe(0);
  });

  it('an unknown or malformed key is missing, never a path outside the store', async () => {
    await expect(store.get(contentKey('0'.repeat(64)))).rejects.toBeInstanceOf(RawObjectMissingError);
    await expect(store.get('../secrets')).rejects.toBeInstanceOf(RawObjectMissingError);
    expect(await store.exists('tmp/whatever')).toBe(false);
  });
});
