import { createHash, randomUUID } from 'node:crypto';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Balance, BalanceCalibration, Reduction, Run, TestArticle, TestRecord } from '@tunnelwright/db';
import { Redis } from 'ioredis';
import { pino } from 'pino';
import request from 'supertest';
import { startReductionWorker, type RunningReductionWorker } from '../../../worker/src/reductions/start-reduction-worker';
import { FixtureBuilder, type FixtureUser } from './fixtures';
import { createTestApp, type TestApp } from './test-app';

/** Identity calibration: bridge outputs equal loads (invented, for tests only). */
export const identityMatrix = [0, 1, 2, 3, 4, 5].map((i) => [0, 1, 2, 3, 4, 5].map((j) => (i === j ? 1 : 0)));

/** An app, a reductions worker on a queue prefix of its own, and the records every ingest test needs. */
export interface IngestWorld {
  t: TestApp;
  fixtures: FixtureBuilder;
  technician: FixtureUser;
  analyst: FixtureUser;
  labManager: FixtureUser;
  customer: FixtureUser;
  rawDir: string;
  uploadDir: string;
  prefix: string;
  worker?: RunningReductionWorker;
  /** A new test (current calibration unless `overdue`) and its id. */
  newTest(options?: { overdue?: boolean; minimumSamplesPerPoint?: number }): Promise<string>;
  /** A new data run of a new (or the given) test. */
  newRun(testId?: string): Promise<string>;
  upload(runId: string, bytes: Buffer, name: string, user?: FixtureUser): Promise<request.Response>;
  /** Waits until the reduction is done or failed. */
  settle(reductionId: string, timeoutMs?: number): Promise<Reduction>;
  close(): Promise<void>;
}

export function sha256(bytes: Buffer): string {
  return createHash('sha256').update(bytes).digest('hex');
}

/**
 * Builds the world. Environment for the ingest services is set before the app first uses them: a raw
 * store folder and an upload spool of this file's own, the upload limit, and a queue prefix.
 */
export async function createIngestWorld(options: { uploadLimitBytes?: number; startWorker?: boolean } = {}): Promise<IngestWorld> {
  const rawDir = mkdtempSync(join(tmpdir(), 'tw-raw-'));
  const uploadDir = mkdtempSync(join(tmpdir(), 'tw-upload-'));
  const prefix = `tw-test-${randomUUID()}`;
  Object.assign(process.env, { RAW_STORE: 'fs', RAW_STORE_DIR: rawDir, UPLOAD_TMP_DIR: uploadDir, QUEUE_PREFIX: prefix, UPLOAD_LIMIT_BYTES: String(options.uploadLimitBytes ?? 500 * 1024 * 1024) });
  const t = await createTestApp();
  const fixtures = new FixtureBuilder(t.knex, t.config.jwtSecret);
  const technician = await fixtures.user({ role: 'technician' });
  const analyst = await fixtures.user({ role: 'analyst' });
  const labManager = await fixtures.user({ role: 'lab_manager' });
  const customer = await fixtures.user({ role: 'customer' });
  const worker =
    options.startWorker === false
      ? undefined
      : await startReductionWorker({ redisUrl: t.config.redisUrl, databaseUrl: t.config.databaseUrl, logger: pino({ level: 'silent' }), prefix, dispatchEveryMs: 1000 });

  const world: IngestWorld = {
    t,
    fixtures,
    technician,
    analyst,
    labManager,
    customer,
    rawDir,
    uploadDir,
    prefix,
    worker,
    async newTest(o = {}) {
      const article = await TestArticle.query(t.knex).insert({
        organisationId: customer.organisationId,
        name: `Ingest article ${fixtures.unique()}`,
        description: '',
        kind: 'road_vehicle',
        conditionOnReceipt: 'as new',
        referenceArea: 0.14,
        referenceAreaKind: 'frontal',
        referenceLength: 0.7,
        volume: 0.1,
        frontalArea: null,
        momentCentreX: 0,
        momentCentreY: 0,
        momentCentreZ: 0,
        scale: 1,
      });
      const balance = await Balance.query(t.knex).insert({ identifier: `IB-${fixtures.unique()}`, description: '', capacities: [400, 400, 1200, 120, 200, 120] });
      await BalanceCalibration.query(t.knex).insert({ balanceId: balance.id, version: 1, matrices: { linear: identityMatrix }, calibratedOn: '2025-01-10', dueOn: o.overdue ? '2025-07-10' : '2099-01-10', enteredBy: labManager.id });
      const tunnel = await fixtures.tunnel();
      const test = await TestRecord.query(t.knex).insert({
        organisationId: customer.organisationId,
        articleId: article.id,
        tunnelId: tunnel.id,
        balanceId: balance.id,
        bookingId: null,
        title: `Ingest test ${fixtures.unique()}`,
        state: 'running',
        configurations: [],
        reductionSettings: { minimumSamplesPerPoint: o.minimumSamplesPerPoint ?? 2, corrections: { solidBlockage: 'frontal-area', wakeBlockage: 'none' } },
        createdBy: labManager.id,
      });
      return test.id;
    },
    async newRun(testId) {
      const id = testId ?? (await world.newTest());
      const latest = await Run.query(t.knex).where('testId', id).orderBy('runNumber', 'desc').first();
      const run = await Run.query(t.knex).insert({ testId: id, runNumber: (latest?.runNumber ?? 0) + 1, kind: 'data', configurationLabel: 'baseline', notes: '', createdBy: technician.id });
      return run.id;
    },
    upload(runId, bytes, name, user = technician) {
      return request(t.app).post(`/api/runs/${runId}/files`).set('Authorization', `Bearer ${user.token}`).attach('file', bytes, name);
    },
    async settle(reductionId, timeoutMs = 30_000) {
      const deadline = Date.now() + timeoutMs;
      for (;;) {
        const reduction = await Reduction.query(t.knex).findById(reductionId);
        if (reduction && (reduction.state === 'done' || reduction.state === 'failed')) return reduction;
        if (Date.now() > deadline) throw new Error(`reduction ${reductionId} still ${reduction?.state} after ${timeoutMs} ms`);
        await new Promise((resolve) => setTimeout(resolve, 100));
      }
    },
    async close() {
      await worker?.close();
      const redis = new Redis(t.config.redisUrl);
      const keys = await redis.keys(`${prefix}:*`);
      if (keys.length > 0) await redis.del(...keys);
      await redis.quit();
      await t.close();
    },
  };
  return world;
}
