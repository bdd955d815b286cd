import { mkdirSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { demoUsers } from '../../../scripts/seed/demo-users';
import { startApiServer, type ApiServer } from './support/api-server';
import { launchBrowser, type TestBrowser } from './support/browser';
import { signIn } from './support/sign-in';

const shots = '/tmp/tw-shots';
// Demo seed: the van test's run 1 awaits approval (so it can still change); the estate car's version 2 is approved.
const openTest = 'Delivery van drag at yaw, open jet';
const approvedTest = 'Estate car yaw sweep, baseline and mirrors off';

function emailOf(role: 'technician' | 'analyst' | 'lab_manager'): string {
  const user = demoUsers.find((candidate) => candidate.role === role);
  if (!user) throw new Error(`The demo seed has no ${role}`);
  return user.email;
}

async function openReview(page: Page, title: string): Promise<void> {
  await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Tests' }).click();
  await page.getByRole('link', { name: title }).click();
  await page.getByRole('link', { name: 'Review', exact: true }).click();
  await page.getByRole('heading', { name: `Review: ${title}` }).waitFor();
}

describe('analyst review of a test', () => {
  let api: ApiServer;
  let browser: TestBrowser;

  beforeAll(async () => {
    mkdirSync(shots, { recursive: true });
    api = await startApiServer();
    browser = await launchBrowser();
  }, 180_000);

  afterEach(() => {
    expect(browser.problems).toEqual([]);
  });

  afterAll(async () => {
    await browser?.close();
    await api?.stop();
  });

  it('charts the run, excludes a point with a reason, restores it after a confirm, and shows the full-scale summary with the caution', async () => {
    const page = await browser.freshPage();
    await signIn(page, api.baseUrl, emailOf('analyst'));
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

    await points.getByRole('button', { name: 'Restore point 2', exact: true }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Restore' }).click();
    await expect.poll(() => points.getByText(/^Excluded:/).count()).toBe(0);
    await page.screenshot({ path: `${shots}/review-restored.png`, fullPage: true });
  }, 120_000);

  it('shows an approved version read-only', async () => {
    const page = await browser.freshPage();
    await signIn(page, api.baseUrl, emailOf('analyst'));
    await openReview(page, approvedTest);
    await page.getByText('This version is approved: its points and exclusions can no longer change.').waitFor();
    expect(await page.getByRole('table', { name: 'Points of run 1' }).getByRole('button').count()).toBe(0);
    await page.screenshot({ path: `${shots}/review-approved.png`, fullPage: true });
  }, 120_000);
});
