import { mkdirSync } from 'node:fs';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { demoUsers } from '../../../scripts/seed/demo-users';
import { startApiServer, type ApiServer } from './support/api-server';
import { launchBrowser, type TestBrowser } from './support/browser';
import { signIn } from './support/sign-in';

const shots = '/tmp/tw-shots';

function emailOf(role: 'lab_manager' | 'customer'): string {
  const user = demoUsers.find((candidate) => candidate.role === role);
  if (!user) {
    throw new Error(`The demo seed has no ${role}`);
  }
  return user.email;
}

describe('catalogue administration', () => {
  let api: ApiServer;
  let browser: TestBrowser;

  beforeAll(async () => {
    mkdirSync(shots, { recursive: true });
    api = await startApiServer();
    browser = await launchBrowser();
  });

  afterEach(() => {
    expect(browser.problems).toEqual([]);
  });

  afterAll(async () => {
    await browser?.close();
    await api?.stop();
  });

  it('a lab manager adds a tunnel after fixing what the form points out, then archives it after confirming', async () => {
    const name = `Boundary-layer tunnel ${Date.now().toString(36)}`;
    const page = await browser.freshPage();
    await signIn(page, api.baseUrl, emailOf('lab_manager'));
    await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Tunnels' }).click();
    await page.getByRole('heading', { name: 'Tunnels' }).waitFor();
    await page.getByRole('button', { name: 'New tunnel' }).first().click();

    const dialog = page.getByRole('dialog');
    await dialog.getByRole('button', { name: 'Create tunnel' }).click();
    await dialog.getByText('Enter a name').waitFor();
    await dialog.getByText('Enter the width').waitFor();
    await page.screenshot({ path: `${shots}/tunnel-form-errors.png` });

    await dialog.getByLabel('Name').fill(name);
    await dialog.getByLabel('Width (m)').fill('1.2');
    await dialog.getByLabel('Height (m)').fill('0.9');
    await dialog.getByRole('button', { name: 'Set area to width × height' }).click();
    await dialog.getByLabel('Length (m)').fill('3');
    await dialog.getByLabel('Maximum speed (m/s)').fill('30');
    await dialog.getByRole('button', { name: 'Create tunnel' }).click();
    await page.getByText(`${name} saved.`).waitFor();
    const row = page.getByRole('row').filter({ hasText: name });
    await row.waitFor();
    expect(await row.innerText()).toContain('1.08');

    await row.getByRole('button', { name: `Archive ${name}` }).click();
    await page.getByRole('dialog').getByText('It leaves the catalogue').waitFor();
    await page.getByRole('dialog').getByRole('button', { name: 'Archive' }).click();
    await page.getByText(`${name} archived.`).waitFor();
    await row.waitFor({ state: 'detached' });

    await page.getByText('Show archived').click();
    await page.getByRole('row').filter({ hasText: `${name} (archived)` }).waitFor();
  });

  it('a customer sees the catalogue without the archived tunnel', async () => {
    const page = await browser.freshPage();
    await signIn(page, api.baseUrl, emailOf('customer'));
    await page.getByText('Services and rates').waitFor();
    await page.locator('tw-catalogue-page mat-progress-bar').waitFor({ state: 'detached' });
    expect(await page.locator('tw-catalogue-page').innerText()).not.toContain('Boundary-layer tunnel');
    expect(await page.locator('tw-catalogue-page').innerText()).toContain('licensed engineer');
  });
});
