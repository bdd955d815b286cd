import { createHash } from 'node:crypto';
import { mkdtempSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Readable } from 'node:stream';
import { describe, expect, it } from 'vitest';
import { FsRawStore } from './fs-raw-store';
import { RawObjectMissingError } from './raw-object-missing-error';
import { contentKey, isContentKey } from './raw-store';

const hex = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');

describe('FsRawStore', () => {
  const store = () => new FsRawStore(mkdtempSync(join(tmpdir(), 'tw-fs-store-')));

  it('stores streamed bytes under their SHA-256, read-only, and leaves no temporary file', async () => {
    const s = store();
    const bytes = Buffer.from('time [s], point\n0, 1\n');
    const stored = await s.put(Readable.from([bytes.subarray(0, 5), bytes.subarray(5)]));
    expect(stored).toEqual({ sha256: hex(bytes), size: bytes.length, key: contentKey(hex(bytes)) });
    expect(readFileSync(s.pathOf(stored.key))).toEqual(bytes);
    expect(statSync(s.pathOf(stored.key)).mode & 0o222).toBe(0);
    expect(readdirSync(join(s.root, 'tmp'))).toEqual([]);
  });

  it('gives the same key for the same bytes and keeps the first copy', async () => {
    const s = store();
    const first = await s.put([Buffer.from('a,b\n')]);
    const again = await s.put([Buffer.from('a,b\n')]);
    expect(again.key).toBe(first.key);
    expect(await s.exists(first.key)).toBe(true);
  });

  it('streams the bytes back', async () => {
    const s = store();
    const bytes = Buffer.alloc(300_000, 7);
    const { key } = await s.put([bytes]);
    const chunks: Buffer[] = [];
    for await (const chunk of await s.get(key)) chunks.push(chunk as Buffer);
    expect(hex(Buffer.concat(chunks))).toBe(hex(bytes));
  });

  it('treats unknown and malformed keys as missing, never as paths', async () => {
    const s = store();
    await expect(s.get(contentKey('a'.repeat(64)))).rejects.toBeInstanceOf(RawObjectMissingError);
    await expect(s.get('../../etc/passwd')).rejects.toBeInstanceOf(RawObjectMissingError);
    expect(await s.exists('sha256/../x')).toBe(false);
    expect(isContentKey(contentKey('b'.repeat(64)))).toBe(true);
    expect(isContentKey(`sha256/bb/bb/${'b'.repeat(63)}`)).toBe(false);
  });
});
