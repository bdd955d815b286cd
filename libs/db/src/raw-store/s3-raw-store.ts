import { randomUUID } from 'node:crypto';
import { createReadStream, createWriteStream } from 'node:fs';
import { mkdir, unlink } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import type { S3Client, S3ClientConfig } from '@aws-sdk/client-s3';
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
  private connected: Promise<S3Client> | undefined;

  constructor(private readonly options: S3RawStoreOptions) {}

  /**
   * The S3 client, made on first use. The SDK is loaded only then, so a process that never touches S3 (the
   * file-system store, the worker's main thread) does not carry it in memory.
   */
  client(): Promise<S3Client> {
    this.connected ??= import('@aws-sdk/client-s3').then(({ S3Client }) => new S3Client(this.clientConfig()));
    return this.connected;
  }

  /** Closes the client's connections, if it was ever made. */
  async close(): Promise<void> {
    if (this.connected) (await this.connected).destroy();
  }

  private clientConfig(): S3ClientConfig {
    const options = this.options;
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
    return config;
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
        const { Upload } = await import('@aws-sdk/lib-storage');
        await new Upload({ client: await this.client(), params: { Bucket: this.options.bucket, Key: key, Body: createReadStream(spool), ContentLength: hashing.size } }).done();
      }
      return { sha256, size: hashing.size, key };
    } finally {
      await unlink(spool).catch(() => undefined);
    }
  }

  async get(key: string): Promise<Readable> {
    if (!isContentKey(key)) throw new RawObjectMissingError(key);
    try {
      const { GetObjectCommand } = await import('@aws-sdk/client-s3');
      const answer = await (await this.client()).send(new GetObjectCommand({ Bucket: this.options.bucket, Key: key }));
      return answer.Body as Readable;
    } catch (error) {
      if (isNotFound(error)) throw new RawObjectMissingError(key);
      throw error;
    }
  }

  async exists(key: string): Promise<boolean> {
    if (!isContentKey(key)) return false;
    try {
      const { HeadObjectCommand } = await import('@aws-sdk/client-s3');
      await (await this.client()).send(new HeadObjectCommand({ Bucket: this.options.bucket, Key: key }));
      return true;
    } catch (error) {
      if (isNotFound(error)) return false;
      throw error;
    }
  }
}
