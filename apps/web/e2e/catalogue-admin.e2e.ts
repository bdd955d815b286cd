import { describe, expect, it } from 'vitest';
import { shots, useBrowserSuite } from './support/browser-suite';
import { demoTunnels } from '../../../scripts/seed/catalogue';
import { demoCustomers } from '../../../scripts/seed/demo-users';
import { demoUser } from './support/sign-in';

describe('catalogue administration', () => {
  const suite = useBrowserSuite();

  it('a lab manager adds a tunnel after fixing what the form points out, then archives it after confirming', async () => {
    const name = `Boundary-layer tunnel ${Date.now().toString(36)}`;
    const page = await suite.signedIn(demoUser('lab_manager').email);
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
    const page = await suite.signedIn(demoUser('customer').email);
    await page.getByText('Services and rates').waitFor();
    await page.locator('tw-catalogue-page mat-progress-bar').waitFor({ state: 'detached' });
    expect(await page.locator('tw-catalogue-page').innerText()).not.toContain('Boundary-layer tunnel');
    expect(await page.locator('tw-catalogue-page').innerText()).toContain('licensed engineer');
  });

  it('a customer opens a tunnel’s free and busy week and sees another customer’s booking only as busy', async () => {
    const page = await suite.signedIn(demoUser('customer', demoCustomers.tarnwick).email);
    await page.locator('tw-catalogue-page mat-progress-bar').first().waitFor({ state: 'detached' });
    const tunnel = demoTunnels[0]!.name;
    const card = page.locator('mat-card').filter({ has: page.getByText(tunnel, { exact: true }) });
    await card.getByRole('button', { name: 'Free and busy times' }).click();
    // The demo has Quillfen's booking in test in this tunnel today.
    const week = page.getByRole('region', { name: `Free and busy times of ${tunnel}` });
    await week.locator('tw-calendar-grid').getByText('Busy').first().waitFor();
    expect(await week.innerText()).not.toContain(demoCustomers.quillfen);
    await page.screenshot({ path: `${shots}/catalogue-week.png`, fullPage: true });
    await card.getByRole('button', { name: 'Hide free and busy times' }).press('Enter');
    await week.waitFor({ state: 'detached' });
  });
});
