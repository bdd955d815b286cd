import { randomUUID } from 'node:crypto';
import { createReadStream, createWriteStream } from 'node:fs';
import { mkdir, unlink } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { GetObjectCommand, HeadObjectCommand, S3Client, type S3ClientConfig } from '@aws-sdk/client-s3';
import { Upload } from '@aws-sdk/lib-storage';
import { HashingStream } from './hash-stream';
import { RawObjectMissingError } from './raw-object-missing-error';
import { contentKey, isContentKey, type RawStore, type StoredObject } from './raw-store';

/** Where the S3 driver keeps raw files. */
export interface S3RawStoreOptions {
  bucket: string;
  endpoint?: string;
  region?: string;
  accessKeyId?: string;
  secretAccessKey?: string;
  /** Path-style URLs (`endpoint/bucket/key`), needed by s3rver and most self-hosted stores. */
  forcePathStyle?: boolean;
  /** Local folder where bytes wait while they are hashed (default: the OS temp folder). */
  spoolDir?: string;
}

function isNotFound(error: unknown): boolean {
  const e = error as { name?: string; $metadata?: { httpStatusCode?: number } };
  return e.name === 'NotFound' || e.name === 'NoSuchKey' || e.$metadata?.httpStatusCode === 404;
}

/**
 * Raw store in an S3 bucket. Bytes are spooled to a local temporary file while hashed (the key is their
 * hash, so it is known only at the end), then uploaded (multipart) under their content key unless that
 * key already exists; the spooled file is removed either way.
 */
export class S3RawStore implements RawStore {
  readonly client: S3Client;

  constructor(private readonly options: S3RawStoreOptions) {
    const config: S3ClientConfig = {
      region: options.region ?? 'us-east-1',
      endpoint: options.endpoint,
      forcePathStyle: options.forcePathStyle ?? true,
      // Without these the SDK frames streamed bodies with checksums that some stores keep inside the object.
      requestChecksumCalculation: 'WHEN_REQUIRED',
      responseChecksumValidation: 'WHEN_REQUIRED',
    };
    if (options.accessKeyId && options.secretAccessKey) {
      config.credentials = { accessKeyId: options.accessKeyId, secretAccessKey: options.secretAccessKey };
    }
    this.client = new S3Client(config);
  }

  async put(input: Readable | AsyncIterable<Buffer | Uint8Array> | Iterable<Buffer | Uint8Array>): Promise<StoredObject> {
    const spoolDir = this.options.spoolDir ?? join(tmpdir(), 'tunnelwright-s3-spool');
    await mkdir(spoolDir, { recursive: true });
    const spool = join(spoolDir, `${randomUUID()}.part`);
    const hashing = new HashingStream();
    try {
      await pipeline(input instanceof Readable ? input : Readable.from(input), hashing, createWriteStream(spool, { flags: 'wx' }));
      const sha256 = hashing.digest();
      const key = contentKey(sha256);
      if (!(await this.exists(key))) {
        await new Upload({ client: this.client, params: { Bucket: this.options.bucket, Key: key, Body: createReadStream(spool), ContentLength: hashing.size } }).done();
      }
      return { sha256, size: hashing.size, key };
    } finally {
      await unlink(spool).catch(() => undefined);
    }
  }

  async get(key: string): Promise<Readable> {
    if (!isContentKey(key)) throw new RawObjectMissingError(key);
    try {
      const answer = await this.client.send(new GetObjectCommand({ Bucket: this.options.bucket, Key: key }));
      return answer.Body as Readable;
    } catch (error) {
      if (isNotFound(error)) throw new RawObjectMissingError(key);
      throw error;
    }
  }

  async exists(key: string): Promise<boolean> {
    if (!isContentKey(key)) return false;
    try {
      await this.client.send(new HeadObjectCommand({ Bucket: this.options.bucket, Key: key }));
      return true;
    } catch (error) {
      if (isNotFound(error)) return false;
      throw error;
    }
  }
}
