import { spawn, type ChildProcess } from 'node:child_process';
import { createReadStream } from 'node:fs';
import { readFile, rm } from 'node:fs/promises';
import { join } from 'node:path';
import { FsRawStore, RawFile, Reduction, ReductionPoint } from '@tunnelwright/db';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { writeLargeRunFile, type LargeRunFile } from '../../../scripts/make-large-run-file';
import { createIngestWorld, sha256, type IngestWorld } from '../../api/test/support/ingest-world';

/** Starts the real worker process (`apps/worker/src/main.ts`) on the world's queue, database and raw store. */
function startWorkerProcess(w: IngestWorld): ChildProcess {
  return spawn(process.execPath, ['--import', 'tsx', 'apps/worker/src/main.ts'], {
    cwd: join(import.meta.dirname, '../../..'),
    env: {
      ...process.env,
      DATABASE_URL: w.t.config.databaseUrl,
      REDIS_URL: w.t.config.redisUrl,
      QUEUE_PREFIX: w.prefix,
      RAW_STORE: 'fs',
      RAW_STORE_DIR: w.rawDir,
      // A short lock, so the job of a killed worker is taken up again within seconds.
      REDUCTION_LOCK_MS: '2000',
      LOG_LEVEL: 'silent',
    },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
}

function exited(child: ChildProcess): Promise<void> {
  return child.exitCode !== null || child.signalCode !== null ? Promise.resolve() : new Promise((resolve) => child.once('exit', () => resolve()));
}

describe('reductions worker killed mid-job', () => {
  let w: IngestWorld;
  let file: LargeRunFile;
  let worker: ChildProcess | undefined;

  beforeAll(async () => {
    w = await createIngestWorld({ startWorker: false });
    file = await writeLargeRunFile(join(w.uploadDir, '..', `tw-crash-${w.prefix}.csv`), 1_000_000, 500);
  });
  afterAll(async () => {
    if (worker && worker.exitCode === null) {
      worker.kill('SIGTERM');
      await exited(worker);
    }
    await rm(file.path, { force: true });
    await w?.close();
  });

  it('SIGKILL once progress > 0, restart: the job completes with the exact point count, no duplicates, raw bytes unchanged', async () => {
    const runId = await w.newRun();
    const upload = await request(w.t.app).post(`/api/runs/${runId}/files`).set('Authorization', `Bearer ${w.technician.token}`).attach('file', createReadStream(file.path), 'million.csv');
    expect(upload.status, JSON.stringify(upload.body)).toBe(202);
    const reductionId: string = upload.body.reduction.id;
    const uploadedSha = upload.body.rawFile.sha256 as string;
    expect(uploadedSha).toBe(sha256(await readFile(file.path)));

    worker = startWorkerProcess(w);
    const deadline = Date.now() + 60_000;
    let seen: Reduction | undefined;
    while (Date.now() < deadline) {
      seen = await Reduction.query(w.t.knex).findById(reductionId);
      if (seen && seen.progress > 0) break;
      await new Promise((resolve) => setTimeout(resolve, 20));
    }
    expect(seen?.state).toBe('running');
    expect(seen?.progress).toBeGreaterThan(0);
    expect(seen?.progress).toBeLessThan(1);
    worker.kill('SIGKILL');
    await exited(worker);
    expect(await ReductionPoint.query(w.t.knex).where('reductionId', reductionId).resultSize()).toBe(0);

    worker = startWorkerProcess(w);
    const done = await w.settle(reductionId, 90_000);
    expect(done.state, done.errorMessage ?? '').toBe('done');
    const points = await ReductionPoint.query(w.t.knex).where('reductionId', reductionId).select('index');
    expect(points).toHaveLength(file.points);
    expect(new Set(points.map((p) => p.index)).size).toBe(file.points);

    const rawFile = await RawFile.query(w.t.knex).findOne({ runId });
    expect(rawFile?.sha256).toBe(uploadedSha);
    const stored = await readFile(new FsRawStore(w.rawDir).pathOf(rawFile?.storageKey ?? ''));
    expect(sha256(stored)).toBe(uploadedSha);
    expect(done.inputSha256).toBe(uploadedSha);

    // Sending the job again after it finished changes nothing.
    await w.t.knex('outbox').where('jobId', reductionId).update({ dispatchedAt: null });
    await new Promise((resolve) => setTimeout(resolve, 6000));
    expect(await ReductionPoint.query(w.t.knex).where('reductionId', reductionId).resultSize()).toBe(file.points);
  }, 180_000);
});
