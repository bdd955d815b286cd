import { spawn, type ChildProcess } from 'node:child_process';
import { createWriteStream, mkdirSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Balance, BalanceCalibration, createKnex, Organisation, TestArticle, TestRecord, Tunnel, User } from '@tunnelwright/db';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { demoCustomers, demoUsers } from '../../../scripts/seed/demo-users';
import { repoRoot, startApiServer, type ApiServer } from './support/api-server';
import { launchBrowser, type TestBrowser } from './support/browser';
import { signIn } from './support/sign-in';

const shots = '/tmp/tw-shots';
const databaseUrl = process.env.TW_E2E_DATABASE_URL ?? 'postgres://postgres@127.0.0.1:54329/tunnelwright_e2e';
const redisUrl = process.env.TW_E2E_REDIS_URL ?? 'redis://127.0.0.1:63790/1';
const exampleFile = join(repoRoot, 'libs/aero/examples/closed-car-yaw-sweep.csv');
const testTitle = 'Estate car yaw sweep (invented)';
const workerLog = '/tmp/tw-e2e-worker.log';

function emailOf(role: 'technician' | 'analyst' | 'lab_manager'): string {
  const user = demoUsers.find((candidate) => candidate.role === role);
  if (!user) throw new Error(`The demo seed has no ${role}`);
  return user.email;
}

/** Starts the background worker with the API's database, queue and raw store, so uploads are reduced. */
function startWorkerProcess(): ChildProcess {
  const log = createWriteStream(workerLog, { flags: 'w' });
  const child = spawn('node', ['--import', 'tsx', 'apps/worker/src/main.ts'], {
    cwd: repoRoot,
    env: { ...process.env, DATABASE_URL: databaseUrl, REDIS_URL: redisUrl, LOG_LEVEL: 'info' },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout?.pipe(log);
  child.stderr?.pipe(log);
  return child;
}

async function stopWorkerProcess(child: ChildProcess | undefined): Promise<void> {
  if (!child || child.exitCode !== null) return;
  const exited = new Promise((done) => child.once('exit', done));
  child.kill('SIGTERM');
  const timer = setTimeout(() => child.kill('SIGKILL'), 10_000);
  await exited;
  clearTimeout(timer);
}

/** Opens a test of the demo customer in the closed-section tunnel, with a balance calibrated until far ahead. */
async function openDemoTest(): Promise<void> {
  const knex = createKnex(databaseUrl);
  try {
    const customer = await Organisation.query(knex).findOne({ name: demoCustomers.quillfen });
    const manager = await User.query(knex).findOne({ email: emailOf('lab_manager') });
    const tunnel = await Tunnel.query(knex).findOne({ kind: 'closed' });
    if (!customer || !manager || !tunnel) throw new Error('The demo seed lacks the customer, lab manager or closed tunnel');
    const article = await TestArticle.query(knex).insert({
      organisationId: customer.id,
      name: 'Estate car model, 1:4 (invented)',
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
      scale: 4,
    });
    const balance = await Balance.query(knex).insert({ identifier: 'SB-E2E-1', description: 'Invented six-component balance', capacities: [400, 400, 1200, 120, 200, 120] });
    const identity = [0, 1, 2, 3, 4, 5].map((i) => [0, 1, 2, 3, 4, 5].map((j) => (i === j ? 1 : 0)));
    await BalanceCalibration.query(knex).insert({ balanceId: balance.id, version: 1, matrices: { linear: identity }, calibratedOn: '2026-01-10', dueOn: '2099-01-10', enteredBy: manager.id });
    await TestRecord.query(knex).insert({
      organisationId: customer.id,
      articleId: article.id,
      tunnelId: tunnel.id,
      balanceId: balance.id,
      bookingId: null,
      title: testTitle,
      state: 'running',
      configurations: [{ label: 'baseline', description: 'as delivered' }],
      reductionSettings: { minimumSamplesPerPoint: 2, corrections: { solidBlockage: 'frontal-area', wakeBlockage: 'none' } },
      createdBy: manager.id,
    });
  } finally {
    await knex.destroy();
  }
}

describe('run files and reductions', () => {
  let api: ApiServer;
  let browser: TestBrowser;
  let worker: ChildProcess | undefined;
  let runUrl = '';

  beforeAll(async () => {
    mkdirSync(shots, { recursive: true });
    // The API and the worker, both child processes, share the raw store, spool folder and queue prefix.
    Object.assign(process.env, {
      RAW_STORE: 'fs',
      RAW_STORE_DIR: mkdtempSync(join(tmpdir(), 'tw-e2e-raw-')),
      UPLOAD_TMP_DIR: mkdtempSync(join(tmpdir(), 'tw-e2e-upload-')),
      QUEUE_PREFIX: `tw-e2e-${Date.now().toString(36)}`,
    });
    api = await startApiServer();
    await openDemoTest();
    worker = startWorkerProcess();
    browser = await launchBrowser();
  }, 180_000);

  afterEach(() => {
    expect(browser.problems).toEqual([]);
  });

  afterAll(async () => {
    await browser?.close();
    await stopWorkerProcess(worker);
    await api?.stop();
  });

  it('a technician creates a run, checks the example file, uploads it with progress and sees the reduced points', async () => {
    const page = await browser.freshPage();
    await signIn(page, api.baseUrl, emailOf('technician'));
    await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Tests' }).click();
    await page.getByRole('link', { name: testTitle }).click();
    await page.getByText('No runs yet').waitFor();
    await page.getByRole('link', { name: 'Upload run files' }).click();

    await page.getByLabel('Configuration label').fill('baseline');
    await page.getByRole('button', { name: 'Create run' }).click();
    await expect.poll(() => page.getByRole('combobox', { name: 'Run' }).innerText()).toContain('Run 1');

    await page.getByLabel('Choose run files').setInputFiles(exampleFile);
    await page.getByText(/samples in 7 points/).waitFor();
    await page.getByRole('table', { name: 'First rows, in SI units' }).waitFor();
    await page.screenshot({ path: `${shots}/ingest-preview.png`, fullPage: true });

    await page.getByRole('button', { name: /Upload 1 checked file/ }).click();
    await page.getByRole('progressbar', { name: 'Upload of closed-car-yaw-sweep.csv' }).waitFor();
    await page.getByText(/Reduction v1: Reduced, 7 points/).waitFor({ timeout: 60_000 });
    await page.screenshot({ path: `${shots}/ingest-uploaded.png`, fullPage: true });

    await page.getByRole('link', { name: 'Back to the test' }).click();
    await page.getByRole('link', { name: 'Run 1' }).click();
    runUrl = page.url();
    const points = page.getByRole('table', { name: 'Reduced points' });
    await points.waitFor();
    await expect.poll(() => points.locator('tbody tr').count()).toBe(7);
    await page.getByText(/SHA-256 [0-9a-f]{64}/).first().waitFor();
    await page.getByRole('note').filter({ hasText: /licensed engineer|design/i }).first().waitFor();
    await page.screenshot({ path: `${shots}/ingest-run.png`, fullPage: true });
  }, 120_000);

  it('an analyst reduces the run again with Maskell and compares the new version with the first', async () => {
    expect(runUrl).not.toBe('');
    const page = await browser.freshPage();
    await signIn(page, api.baseUrl, emailOf('analyst'));
    await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Tests' }).click();
    await page.getByRole('link', { name: testTitle }).click();
    await page.getByRole('link', { name: 'Run 1' }).click();
    expect(page.url()).toBe(runUrl);
    await page.getByRole('table', { name: 'Reduced points' }).waitFor();

    await page.getByRole('combobox', { name: 'Wake blockage' }).click();
    await page.getByRole('option', { name: /Maskell/ }).click();
    await page.getByRole('button', { name: 'Reduce again as a new version' }).click();
    await expect.poll(() => page.getByRole('combobox', { name: 'Version shown' }).innerText(), { timeout: 60_000 }).toMatch(/v2 · Reduced · 7 points/);

    const comparison = page.getByRole('table', { name: 'Version 1 against version 2' });
    await comparison.waitFor();
    await expect.poll(() => comparison.locator('tbody tr').count()).toBe(7);
    await page.screenshot({ path: `${shots}/ingest-compare.png`, fullPage: true });
  }, 120_000);
});
