import { randomUUID } from 'node:crypto';
import { Readable } from 'node:stream';
import { CopyObjectCommand, DeleteObjectCommand, GetObjectCommand, HeadObjectCommand, S3Client, type S3ClientConfig } from '@aws-sdk/client-s3';
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
}

function isNotFound(error: unknown): boolean {
  const e = error as { name?: string; $metadata?: { httpStatusCode?: number } };
  return e.name === 'NotFound' || e.name === 'NoSuchKey' || e.$metadata?.httpStatusCode === 404;
}

/**
 * Raw store in an S3 bucket. Bytes are uploaded (multipart) under a temporary key while hashed, then
 * copied to their content key unless that key already exists, and the temporary object is removed.
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
    const hashing = new HashingStream();
    const source = input instanceof Readable ? input : Readable.from(input);
    source.on('error', (error) => hashing.destroy(error));
    source.pipe(hashing);
    const temporaryKey = `tmp/${randomUUID()}`;
    const { bucket } = this.options;
    try {
      await new Upload({ client: this.client, params: { Bucket: bucket, Key: temporaryKey, Body: hashing } }).done();
      const sha256 = hashing.digest();
      const key = contentKey(sha256);
      if (!(await this.exists(key))) {
        await this.client.send(new CopyObjectCommand({ Bucket: bucket, Key: key, CopySource: `${bucket}/${temporaryKey}` }));
      }
      return { sha256, size: hashing.size, key };
    } finally {
      await this.client.send(new DeleteObjectCommand({ Bucket: bucket, Key: temporaryKey })).catch(() => undefined);
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
