/**
 * Ingest benchmark: for a 20,000-row and a 1,000,000-row run file, the time from the end of the upload
 * (the API's 202) until the run's points are queryable through the API, and the worker's peak RSS.
 * Runs the real API (listening on a loopback port) and the real worker process against a database of its
 * own (`tunnelwright_bench`, recreated each time) on the local PostgreSQL and Redis (`scripts/services.sh start`).
 *   npm run bench:ingest              # targets: 1.5 s, 6 s, 200 MB
 */
import { spawn } from 'node:child_process';
import { randomBytes, randomUUID } from 'node:crypto';
import { openAsBlob, readdirSync, readFileSync } from 'node:fs';
import { mkdtemp, rm } from 'node:fs/promises';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import knexFactory from 'knex';
import { Balance, BalanceCalibration, createKnex, migrationConfig, Organisation, Run, TestArticle, TestRecord, Tunnel, User } from '@tunnelwright/db';
import { Redis } from 'ioredis';
import { createApp } from '../../apps/api/src/app';
import { signAccessToken } from '../../apps/api/src/auth/access-tokens';
import { loadConfig } from '../../apps/api/src/config';
import { createSmtpMailer } from '../../apps/api/src/mail/mailer';
import { writeLargeRunFile } from '../make-large-run-file';

const root = fileURLToPath(new URL('../..', import.meta.url));
const adminUrl = process.env.BENCH_ADMIN_DATABASE_URL ?? 'postgres://postgres@127.0.0.1:54329/postgres';
const databaseUrl = adminUrl.replace(/\/[^/]*$/, '/tunnelwright_bench');
const redisUrl = process.env.REDIS_URL ?? 'redis://127.0.0.1:63790/2';
// The first job starts the worker's sandbox thread, which loads and compiles the engine: timed apart.
const sizes = [2_000, 20_000, 1_000_000];
const targets: Record<number, number> = { 20_000: 1.5, 1_000_000: 6 };
const rssTargetMb = 200;

async function recreateDatabase(): Promise<void> {
  const admin = knexFactory({ client: 'pg', connection: adminUrl });
  await admin.raw('DROP DATABASE IF EXISTS tunnelwright_bench WITH (FORCE)');
  await admin.raw('CREATE DATABASE tunnelwright_bench');
  await admin.destroy();
}

/** A figure of `/proc/<pid>/status` in MB (0 once the process is gone). */
function statusMb(pid: number, field: 'VmHWM' | 'VmRSS'): number {
  try {
    const status = readFileSync(`/proc/${pid}/status`, 'utf8');
    return Number(new RegExp(`${field}:\\s+(\\d+)`).exec(status)?.[1] ?? 0) / 1024;
  } catch {
    return 0;
  }
}

/** The process and all its descendants (the worker could fork helpers: they count too). */
function processTree(pid: number): number[] {
  const tree = [pid];
  for (let i = 0; i < tree.length; i++) {
    try {
      for (const task of readdirSync(`/proc/${tree[i]}/task`)) {
        const children = readFileSync(`/proc/${tree[i]}/task/${task}/children`, 'utf8').trim();
        if (children) tree.push(...children.split(/\s+/).map(Number));
      }
    } catch {
      // the process ended meanwhile
    }
  }
  return tree;
}

/**
 * Worker memory: the peak resident set of the worker process (VmHWM, which includes its threads, so the
 * sandbox thread) and the largest sum of resident sets over its whole process tree, sampled every 50 ms.
 */
function watchWorkerMemory(pid: number): { stop(): { processPeakMb: number; treePeakMb: number } } {
  let treePeakMb = 0;
  const sample = () => {
    treePeakMb = Math.max(treePeakMb, processTree(pid).reduce((sum, p) => sum + statusMb(p, 'VmRSS'), 0));
  };
  const timer = setInterval(sample, 50);
  return {
    stop() {
      clearInterval(timer);
      sample();
      return { processPeakMb: statusMb(pid, 'VmHWM'), treePeakMb };
    },
  };
}

const work = await mkdtemp(join(tmpdir(), 'tw-bench-ingest-'));
const prefix = `tw-bench-${randomUUID()}`;
Object.assign(process.env, { RAW_STORE: 'fs', RAW_STORE_DIR: join(work, 'raw'), UPLOAD_TMP_DIR: join(work, 'spool'), QUEUE_PREFIX: prefix });

await recreateDatabase();
const knex = createKnex(databaseUrl);
await knex.migrate.latest(migrationConfig);
const config = { ...loadConfig({ ...process.env, DATABASE_URL: databaseUrl, REDIS_URL: redisUrl, JWT_SECRET: randomBytes(32).toString('hex'), LOG_LEVEL: 'silent' }) };
const redis = new Redis(redisUrl);
const mailer = createSmtpMailer(config.smtpUrl, config.mailFrom);
const app = createApp({ config, knex, redis, mailer });
const server = app.listen(0, '127.0.0.1');
await new Promise((resolve) => server.once('listening', resolve));
const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;

const lab = await Organisation.query(knex).insert({ name: 'Bench laboratory', kind: 'lab', timeZone: 'UTC', settings: {} });
const customer = await Organisation.query(knex).insert({ name: 'Bench customer', kind: 'customer', settings: {} });
const technician = await User.query(knex).insert({ email: 'bench-technician@example.invalid', name: 'Bench technician', role: 'technician', organisationId: lab.id, passwordHash: 'x', active: true });
const token = signAccessToken(config.jwtSecret, technician);
const tunnel = await Tunnel.query(knex).insert({ name: 'Bench tunnel', kind: 'closed', description: '', width: 2.4, height: 1.8, area: 4.32, length: 6, minSpeed: 0, maxSpeed: 60, pressureGradient: 0, shapeFactor: 0.86, openJetConstants: {}, capabilities: {} });
const article = await TestArticle.query(knex).insert({ organisationId: customer.id, name: 'Bench article', description: '', kind: 'road_vehicle', conditionOnReceipt: '', referenceArea: 0.14, referenceAreaKind: 'frontal', referenceLength: 0.7, volume: 0.1, frontalArea: null, momentCentreX: 0, momentCentreY: 0, momentCentreZ: 0, scale: 1 });
const balance = await Balance.query(knex).insert({ identifier: 'BENCH-1', description: '', capacities: [400, 400, 1200, 120, 200, 120] });
const identity = [0, 1, 2, 3, 4, 5].map((i) => [0, 1, 2, 3, 4, 5].map((j) => (i === j ? 1 : 0)));
await BalanceCalibration.query(knex).insert({ balanceId: balance.id, version: 1, matrices: { linear: identity }, calibratedOn: '2026-01-01', dueOn: '2099-01-01', enteredBy: technician.id });
const test = await TestRecord.query(knex).insert({ organisationId: customer.id, articleId: article.id, tunnelId: tunnel.id, balanceId: balance.id, bookingId: null, title: 'Bench test', state: 'running', configurations: [], reductionSettings: { corrections: { solidBlockage: 'frontal-area' } }, createdBy: technician.id });

const worker = spawn(process.execPath, ['--import', 'tsx', 'apps/worker/src/main.ts'], {
  cwd: root,
  env: { ...process.env, DATABASE_URL: databaseUrl, REDIS_URL: redisUrl, QUEUE_PREFIX: prefix, LOG_LEVEL: 'silent' },
  stdio: ['ignore', 'ignore', 'inherit'],
});
// From the start: the worker's start-up (its build of the sandbox module included) counts too.
const memory = watchWorkerMemory(worker.pid ?? 0);
// Let the worker load its code and its sandbox thread before the clock starts.
await new Promise((resolve) => setTimeout(resolve, 4000));

const results: { rows: number; mb: number; uploadSeconds: number; seconds: number; points: number }[] = [];
try {
  for (const [n, rows] of sizes.entries()) {
    const file = await writeLargeRunFile(join(work, `run-${rows}.csv`), rows, 1000);
    const run = await Run.query(knex).insert({ testId: test.id, runNumber: n + 1, kind: 'data', configurationLabel: '', notes: '', createdBy: technician.id });
    const form = new FormData();
    form.append('file', await openAsBlob(file.path), `run-${rows}.csv`);
    const startUpload = performance.now();
    const response = await fetch(`${base}/api/runs/${run.id}/files`, { method: 'POST', headers: { Authorization: `Bearer ${token}` }, body: form });
    const uploaded = performance.now();
    if (response.status !== 202) throw new Error(`upload answered ${response.status}: ${await response.text()}`);
    const { reduction } = (await response.json()) as { reduction: { id: string } };
    let points = 0;
    for (;;) {
      const page = await fetch(`${base}/api/reductions/${reduction.id}`, { headers: { Authorization: `Bearer ${token}` } });
      const body = (await page.json()) as { state: string; pointCount: number; error: unknown };
      if (body.state === 'failed') throw new Error(`reduction failed: ${JSON.stringify(body.error)}`);
      if (body.state === 'done') {
        const list = (await (await fetch(`${base}/api/reductions/${reduction.id}/points?limit=5000`, { headers: { Authorization: `Bearer ${token}` } })).json()) as { total: number };
        points = list.total;
        break;
      }
      await new Promise((resolve) => setTimeout(resolve, 20));
    }
    const seconds = (performance.now() - uploaded) / 1000;
    if (points !== file.points) throw new Error(`expected ${file.points} points, the API lists ${points}`);
    results.push({ rows, mb: file.bytes / 1e6, uploadSeconds: (uploaded - startUpload) / 1000, seconds, points });
  }
  const { processPeakMb, treePeakMb } = memory.stop();
  const rss = Math.max(processPeakMb, treePeakMb);
  console.log('Ingest benchmark (upload end → points queryable through the API)');
  for (const r of results) {
    const target = targets[r.rows];
    if (target === undefined) {
      console.log(`  ${String(r.rows).padStart(9)} rows  ${r.mb.toFixed(1).padStart(6)} MB  upload ${r.uploadSeconds.toFixed(2)} s  → queryable ${r.seconds.toFixed(2)} s  (first job: sandbox thread starts cold)`);
      continue;
    }
    console.log(
      `  ${String(r.rows).padStart(9)} rows  ${r.mb.toFixed(1).padStart(6)} MB  upload ${r.uploadSeconds.toFixed(2)} s  ` +
        `→ queryable ${r.seconds.toFixed(2)} s (target ${target} s, ${r.seconds <= target ? 'met' : 'MISSED'})  ${r.points} points`,
    );
  }
  console.log(
    `  worker peak RSS ${rss.toFixed(0)} MB (target ${rssTargetMb} MB, ${rss <= rssTargetMb ? 'met' : 'MISSED'}; process VmHWM ${processPeakMb.toFixed(0)} MB, process tree sampled ${treePeakMb.toFixed(0)} MB)`,
  );
} finally {
  worker.kill('SIGTERM');
  await new Promise((resolve) => worker.once('exit', resolve));
  server.close();
  mailer.close();
  const keys = await redis.keys(`${prefix}:*`);
  if (keys.length > 0) await redis.del(...keys);
  await redis.quit();
  await knex.destroy();
  await rm(work, { recursive: true, force: true });
}
