import { randomUUID } from 'node:crypto';
import { createReadStream, createWriteStream } from 'node:fs';
import { access, link, mkdir, unlink, chmod } from 'node:fs/promises';
import { dirname, join } from 'node:path';
import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { HashingStream } from './hash-stream';
import { RawObjectMissingError } from './raw-object-missing-error';
import { contentKey, isContentKey, type RawStore, type StoredObject } from './raw-store';

/** Raw store on the local file system, under `root` (default `.data/raw`, or `RAW_STORE_DIR`). */
export class FsRawStore implements RawStore {
  constructor(readonly root: string) {}

  async put(input: Readable | AsyncIterable<Buffer | Uint8Array> | Iterable<Buffer | Uint8Array>): Promise<StoredObject> {
    const temporaryDir = join(this.root, 'tmp');
    await mkdir(temporaryDir, { recursive: true });
    const temporary = join(temporaryDir, `${randomUUID()}.part`);
    const hashing = new HashingStream();
    try {
      await pipeline(input instanceof Readable ? input : Readable.from(input), hashing, createWriteStream(temporary, { flags: 'wx' }));
      const sha256 = hashing.digest();
      const key = contentKey(sha256);
      const target = this.pathOf(key);
      await mkdir(dirname(target), { recursive: true });
      try {
        // A hard link never replaces an existing file, unlike rename: the first copy stays.
        await link(temporary, target);
        await chmod(target, 0o444);
      } catch (error) {
        if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
      }
      return { sha256, size: hashing.size, key };
    } finally {
      await unlink(temporary).catch(() => undefined);
    }
  }

  async get(key: string): Promise<Readable> {
    if (!(await this.exists(key))) throw new RawObjectMissingError(key);
    return createReadStream(this.pathOf(key));
  }

  async exists(key: string): Promise<boolean> {
    if (!isContentKey(key)) return false;
    return access(this.pathOf(key)).then(
      () => true,
      () => false,
    );
  }

  /** Absolute path of a key's file. */
  pathOf(key: string): string {
    if (!isContentKey(key)) throw new RawObjectMissingError(key);
    return join(this.root, key);
  }
}
