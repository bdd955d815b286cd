import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createRawStore, dispatchReductionOutbox, queuePrefix, reductionQueue, type RawStore } from '@tunnelwright/db';
import { Queue } from 'bullmq';
import type { AppDeps } from '../deps';

/** Default largest accepted upload: 500 MB. */
export const defaultUploadLimitBytes = 500 * 1024 * 1024;

/** What the ingest routes need beside the app's own dependencies, read from the environment once per app. */
export interface IngestServices {
  rawStore: RawStore;
  reductionQueue: Queue;
  /** Largest accepted upload, bytes (`UPLOAD_LIMIT_BYTES`). */
  uploadLimitBytes: number;
  /** Where uploads are spooled before they are stored (`UPLOAD_TMP_DIR`, default the OS temp folder). */
  uploadDir: string;
  /** Sends the listed outbox messages (or every undispatched one) to their queue. */
  dispatch(ids?: string[]): Promise<number>;
}

const services = new WeakMap<AppDeps, IngestServices>();

function uploadLimit(env: NodeJS.ProcessEnv): number {
  if (env.UPLOAD_LIMIT_BYTES === undefined) return defaultUploadLimitBytes;
  const limit = Number(env.UPLOAD_LIMIT_BYTES);
  if (!Number.isInteger(limit) || limit <= 0) throw new Error(`UPLOAD_LIMIT_BYTES must be a positive whole number of bytes, got "${env.UPLOAD_LIMIT_BYTES}"`);
  return limit;
}

/** The ingest services of one app, created on first use from `process.env`. */
export function ingestServices(deps: AppDeps, env: NodeJS.ProcessEnv = process.env): IngestServices {
  const existing = services.get(deps);
  if (existing) return existing;
  const queue = new Queue(reductionQueue.name, { connection: deps.redis, prefix: queuePrefix(env) });
  const created: IngestServices = {
    rawStore: createRawStore(env),
    reductionQueue: queue,
    uploadLimitBytes: uploadLimit(env),
    uploadDir: env.UPLOAD_TMP_DIR ?? join(tmpdir(), 'tunnelwright-uploads'),
    dispatch: (ids) => dispatchReductionOutbox(deps.knex, queue, { prefix: queuePrefix(env), ids }),
  };
  services.set(deps, created);
  return created;
}
