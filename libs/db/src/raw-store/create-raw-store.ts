import { resolve } from 'node:path';
import { FsRawStore } from './fs-raw-store';
import type { RawStore } from './raw-store';
import { S3RawStore } from './s3-raw-store';

/**
 * Chooses the raw store from the environment: `RAW_STORE=s3` with `S3_BUCKET`, `S3_ENDPOINT`, `S3_REGION`,
 * `S3_ACCESS_KEY_ID`, `S3_SECRET_ACCESS_KEY` (and `S3_FORCE_PATH_STYLE=false` for virtual-host URLs);
 * otherwise the file system under `RAW_STORE_DIR` (default `.data/raw`).
 */
export function createRawStore(env: NodeJS.ProcessEnv = process.env): RawStore {
  const driver = env.RAW_STORE ?? 'fs';
  if (driver === 's3') {
    if (!env.S3_BUCKET) throw new Error('RAW_STORE=s3 requires S3_BUCKET');
    return new S3RawStore({
      bucket: env.S3_BUCKET,
      endpoint: env.S3_ENDPOINT,
      region: env.S3_REGION,
      accessKeyId: env.S3_ACCESS_KEY_ID,
      secretAccessKey: env.S3_SECRET_ACCESS_KEY,
      forcePathStyle: env.S3_FORCE_PATH_STYLE !== 'false',
    });
  }
  if (driver !== 'fs') throw new Error(`RAW_STORE must be fs or s3, got "${driver}"`);
  return new FsRawStore(resolve(env.RAW_STORE_DIR ?? '.data/raw'));
}
