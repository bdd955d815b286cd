import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { BalanceCalibration, createKnex, createRawStore, RawFile, Run, TestArticle, TestRecord, Tunnel, User } from '@tunnelwright/db';
import type { Knex } from 'knex';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { buildReductionConfig } from '../../api/src/ingest/build-reduction-config';
import { queueReduction } from '../../api/src/ingest/queue-reduction';
import { runReduction } from '../../worker/src/reductions/run-reduction';
import { databaseUrl, repoRoot } from './support/api-server';
import { shots, useBrowserSuite } from './support/browser-suite';
import { demoUser } from './support/sign-in';

// Demo seed: the van test's run 1 awaits approval (so it can still change); the estate car's version 2 is approved.
const openTest = 'Delivery van drag at yaw, open jet';
const approvedTest = 'Estate car yaw sweep, baseline and mirrors off';
const sphereTest = 'Turbulence sphere check (invented)';
const header = 'time [s], point, yaw [deg], pitch [deg], q [Pa], p_baro [hPa], T_air [degC], RH [%], Fx [N], Fy [N], Fz [N], Mx [N m], My [N m], Mz [N m]';

/** Adds a run to a test and reduces its file right here with the worker's own code, as the demo seed does. */
async function addReducedRun(knex: Knex, testId: string, kind: Run['kind'], configurationLabel: string, fileName: string, bytes: Buffer): Promise<void> {
  const technician = await User.query(knex).findOne({ role: 'technician' }).throwIfNotFound();
  const test = await TestRecord.query(knex).findById(testId).withGraphFetched('[article, tunnel, balance]').throwIfNotFound();
  const calibration = test.balanceId ? await BalanceCalibration.query(knex).where('balanceId', test.balanceId).orderBy('version', 'desc').first() : undefined;
  const latest = await Run.query(knex).where('testId', testId).max('runNumber as last').first();
  const run = await Run.query(knex).insert({ testId, runNumber: Number((latest as unknown as { last: number | null }).last ?? 0) + 1, kind, configurationLabel, notes: '', createdBy: technician.id });
  const store = createRawStore();
  const stored = await store.put([bytes]);
  const config = buildReductionConfig(test, calibration, {});
  const reductionId = await knex.transaction(async (trx) => {
    const rawFile = await RawFile.query(trx).insert({ runId: run.id, originalName: fileName, size: stored.size, sha256: stored.sha256, storageKey: stored.key, uploadedBy: technician.id });
    const queued = await queueReduction(trx, { runId: run.id, rawFileId: rawFile.id, inputSha256: stored.sha256, config, calibration: { calibration, overrideId: null }, createdBy: technician.id });
    await trx('outbox').where('id', queued.outboxId).update({ dispatchedAt: new Date() });
    return queued.reduction.id;
  });
  const outcome = await runReduction(knex, store, reductionId, () => undefined);
  if (outcome.kind !== 'done') throw new Error(`the ${configurationLabel} run did not reduce: ${JSON.stringify(outcome)}`);
}

/**
 * Extra demo records: a mirrors-off run on the estate car (the example file with 3 % less axial force), and a
 * 150 mm sphere test whose invented drag falls through 0.3 between 26 and 29 m/s.
 */
async function addReviewRecords(): Promise<void> {
  const knex = createKnex(databaseUrl);
  try {
    const estate = await TestRecord.query(knex).findOne({ title: approvedTest }).throwIfNotFound();
    const example = readFileSync(join(repoRoot, 'libs/aero/examples/closed-car-yaw-sweep.csv'), 'utf8');
    const mirrorsOff = example
      .split('\n')
      .map((line) => {
        const cells = line.split(', ');
        if (line.startsWith('#') || cells.length !== 14 || Number.isNaN(Number(cells[8]))) return line;
        cells[8] = (Number(cells[8]) * 0.97).toFixed(3);
        return cells.join(', ');
      })
      .join('\n');
    await addReducedRun(knex, estate.id, 'data', 'mirrors off', 'mirrors-off.csv', Buffer.from(mirrorsOff));

    const manager = await User.query(knex).findOne({ role: 'lab_manager' }).throwIfNotFound();
    const tunnel = await Tunnel.query(knex).findOne({ name: 'Tunnel 1 — closed section' }).throwIfNotFound();
    const area = (Math.PI / 4) * 0.15 * 0.15;
    const article = await TestArticle.query(knex).insert({
      organisationId: estate.organisationId,
      name: 'Calibration sphere, 150 mm (invented)',
      description: '',
      kind: 'sphere',
      conditionOnReceipt: 'polished',
      referenceArea: area,
      referenceAreaKind: 'frontal',
      referenceLength: 0.15,
      volume: 0,
      frontalArea: null,
      momentCentreX: 0,
      momentCentreY: 0,
      momentCentreZ: 0,
      scale: 1,
    });
    const sphere = await TestRecord.query(knex).insert({
      organisationId: estate.organisationId,
      articleId: article.id,
      tunnelId: tunnel.id,
      balanceId: estate.balanceId,
      bookingId: null,
      title: sphereTest,
      state: 'running',
      configurations: [],
      reductionSettings: { minimumSamplesPerPoint: 2, corrections: { solidBlockage: 'none', wakeBlockage: 'none' } },
      createdBy: manager.id,
    });
    const rows: string[] = [];
    [[15, 0.47], [19, 0.46], [23, 0.42], [26, 0.35], [29, 0.2], [32, 0.1], [36, 0.09]].forEach(([speed, cd], i) => {
      const q = 0.6 * speed * speed;
      for (const [s, delta] of [-0.005, 0.005].entries()) rows.push([(i * 2 + s) / 100, i + 1, 0, 0, q.toFixed(4), 1013.25, 20.5, 45, (cd * q * area + delta).toFixed(6), 0, 0, 0, 0, 0].join(', '));
    });
    await addReducedRun(knex, sphere.id, 'sphere_calibration', 'sphere', 'sphere.csv', Buffer.from(`${header}\n${rows.join('\n')}\n`));
  } finally {
    await knex.destroy();
  }
}

async function openReview(page: Page, title: string): Promise<void> {
  await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Tests' }).click();
  await page.getByRole('link', { name: title }).click();
  await page.getByRole('link', { name: 'Review', exact: true }).click();
  await page.getByRole('heading', { name: `Review: ${title}` }).waitFor();
}

describe('analyst review of a test', () => {
  const suite = useBrowserSuite({
    // The records added here and the API read raw files from one store.
    beforeApiStart: () => Object.assign(process.env, { RAW_STORE: 'fs', RAW_STORE_DIR: mkdtempSync(join(tmpdir(), 'tw-e2e-raw-')) }),
    afterApiStart: addReviewRecords,
    setupTimeoutMs: 180_000,
  });

  it('charts the run, excludes a point with a reason, restores it after a confirm, and shows the full-scale summary with the caution', async () => {
    const page = await suite.signedIn(demoUser('analyst').email);
    await openReview(page, openTest);
    await page.getByRole('img', { name: /Drag coefficient against yaw: Run 1/ }).waitFor();
    await page.getByRole('note').filter({ hasText: /not design loads/ }).first().waitFor();

    const points = page.getByRole('table', { name: 'Points of run 1' });
    await points.waitFor();
    await points.getByRole('button', { name: 'Exclude point 2', exact: true }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Reason').fill('too short');
    await dialog.getByRole('button', { name: 'Exclude point' }).click();
    await dialog.getByText('Write at least 10 characters').waitFor();
    await dialog.getByLabel('Reason').fill('Yaw table still moving when sampled');
    await dialog.getByRole('button', { name: 'Exclude point' }).click();
    await points.getByText('Excluded: Yaw table still moving when sampled').waitFor();
    await page.getByText(/1 excluded point\(s\) left out/).waitFor();
    await page.screenshot({ path: `${shots}/review-excluded.png`, fullPage: true });

    await page.getByRole('button', { name: 'Tail wind' }).click();
    await page.getByRole('heading', { name: 'Tail wind at full scale' }).waitFor();
    await page.getByRole('img', { name: /Power against wind direction/ }).waitFor();
    await page.getByText(/Reynolds number than the full-scale vehicle/).waitFor();
    // ISA sea level until the analyst enters the day's air; then dry air at what was entered.
    await page.getByText(/ISA sea-level air \(1\.225 kg\/m³, 15 °C, 1,013\.25 hPa\)/).waitFor();
    await page.getByLabel('Air temperature (°C)').fill('35');
    await page.getByLabel('Air pressure (hPa)').fill('990');
    await page.getByRole('button', { name: 'Estimate' }).click();
    await page.getByText(/dry air at 35 °C and 990 hPa \(1\.119 kg\/m³\)/).waitFor();

    await points.getByRole('button', { name: 'Restore point 2', exact: true }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Restore' }).click();
    await expect.poll(() => points.getByText(/^Excluded:/).count()).toBe(0);
    await page.screenshot({ path: `${shots}/review-restored.png`, fullPage: true });
  }, 120_000);

  it('shows an approved version read-only', async () => {
    const page = await suite.signedIn(demoUser('analyst').email);
    await openReview(page, approvedTest);
    await page.getByText('This version is approved: its points and exclusions can no longer change.').waitFor();
    expect(await page.getByRole('table', { name: 'Points of run 1' }).getByRole('button').count()).toBe(0);
    await page.screenshot({ path: `${shots}/review-approved.png`, fullPage: true });
  }, 120_000);

  it('overlays two configurations and gives the drag difference from the baseline in counts', async () => {
    const page = await suite.signedIn(demoUser('analyst').email);
    await openReview(page, approvedTest);
    // The seed leaves one point of run 1 version 2 out, with its reason, so the baseline has one yaw fewer.
    await page.getByRole('img', { name: /Drag coefficient against yaw: Run 1 baseline v2, 6 points; Run 2 mirrors off v1, 7 points/ }).waitFor();
    const deltas = page.getByRole('table', { name: 'Drag difference from the baseline' });
    await deltas.waitFor();
    await expect.poll(() => deltas.locator('tbody tr').count()).toBe(7);
    // ΔC_D in counts is (C_D − C_D,baseline)/0.0001 (1 drag count = 0.0001, common practice); with both C_D shown to
    // four decimals the shown difference agrees to within 1 count. The yaw the baseline left out has no difference.
    const number = (text: string) => Number(text.replace(/,/g, ''));
    let compared = 0;
    for (const row of await deltas.locator('tbody tr').all()) {
      const [cd, base, delta] = await Promise.all(['cd', 'baseline', 'delta'].map((column) => row.locator(`td.mat-column-${column}`).innerText()));
      if (delta === 'No baseline point at this yaw') {
        expect(base).toBe('—');
        continue;
      }
      expect(Math.abs(number(delta) - (number(cd) - number(base)) / 1e-4)).toBeLessThanOrEqual(1);
      compared++;
    }
    expect(compared).toBe(6);
    await page.getByRole('checkbox', { name: /Run 2/ }).click();
    await page.getByText('Tick two or more runs').waitFor();
    await page.screenshot({ path: `${shots}/review-baseline.png`, fullPage: true });
  }, 120_000);

  it('plots a sphere calibration against the published curves with its turbulence factor', async () => {
    const page = await suite.signedIn(demoUser('technician').email);
    await openReview(page, sphereTest);
    await page.getByRole('img', { name: /sphere C_D against Reynolds number/ }).waitFor();
    await page.getByText('Turbulence factor TF = 385 000 / Re_crit').waitFor();
    const factor = await page.locator('dt:has-text("Turbulence factor") + dd').innerText();
    expect(Number(factor)).toBeGreaterThan(1);
    await page.getByText(/Sphere, Morrison 2013 correlation: Morrison 2013/).waitFor();
    // Technicians may look but not exclude.
    expect(await page.getByRole('table', { name: 'Points of run 1' }).getByRole('button').count()).toBe(0);
    await page.screenshot({ path: `${shots}/review-sphere.png`, fullPage: true });
  }, 120_000);
});
