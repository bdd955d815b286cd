import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { repoRoot } from './support/api-server';
import { shots } from './support/browser-suite';
import { demoUser } from './support/sign-in';
import { useReducingSuite } from './support/worker-process';

const exampleFile = join(repoRoot, 'libs/aero/examples/closed-car-yaw-sweep.csv');
const testTitle = 'Estate car yaw sweep (invented)';

describe('run files and reductions', () => {
  const suite = useReducingSuite(
    { title: testTitle, articleName: 'Estate car model, 1:4 (invented)', balanceIdentifier: 'SB-E2E-1', configuration: { label: 'baseline', description: 'as delivered' } },
    '/tmp/tw-e2e-worker.log',
  );
  let runUrl = '';

  it('a technician creates a run, checks the example file, uploads it with progress and sees the reduced points', async () => {
    const page = await suite.signedIn(demoUser('technician').email);
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
    await page.waitForURL(/\/runs\/[0-9a-f-]{36}$/);
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
    const page = await suite.signedIn(demoUser('analyst').email);
    await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Tests' }).click();
    await page.getByRole('link', { name: testTitle }).click();
    await page.getByRole('link', { name: 'Run 1' }).click();
    // The router moves after the click resolves: wait for the run's address, then check it is the same run.
    await page.waitForURL(/\/runs\/[0-9a-f-]{36}$/);
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
