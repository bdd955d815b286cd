import { describe, expect, it } from 'vitest';
import { demoCustomers } from '../../../scripts/seed/demo-users';
import { shots, useBrowserSuite } from './support/browser-suite';
import { demoUser } from './support/sign-in';

describe('opening a test and recording its article', () => {
  const suite = useBrowserSuite();
  const stamp = Date.now().toString(36);
  const articleName = `Cargo-bike fairing model ${stamp} (invented)`;
  const title = `Cargo-bike fairing drag ${stamp} (invented)`;

  it('a technician records an article after fixing what the form points out, opens a test with two configurations and goes on to upload run files', async () => {
    const page = await suite.signedIn(demoUser('technician').email);
    await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Tests', exact: true }).click();
    await page.getByRole('link', { name: 'Open a test' }).click();
    await page.getByRole('heading', { name: 'Open a test' }).waitFor();

    await page.getByLabel('Title').fill(title);
    await page.getByRole('combobox', { name: 'Customer organisation' }).click();
    await page.getByRole('option', { name: demoCustomers.tarnwick }).click();
    await page.getByRole('button', { name: 'Record a new article' }).click();

    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Scale', { exact: true }).fill('0');
    await dialog.getByRole('button', { name: 'Record article' }).click();
    await dialog.getByText('Enter a name').waitFor();
    await dialog.getByText('Enter the reference area').waitFor();
    await dialog.getByText('Scale must be greater than zero').waitFor();
    await page.screenshot({ path: `${shots}/article-form-errors.png` });

    await dialog.getByLabel('Name', { exact: true }).fill(articleName);
    await dialog.getByRole('combobox', { name: 'Kind' }).click();
    await page.getByRole('option', { name: 'Sports equipment' }).click();
    await dialog.getByLabel('Condition on receipt').fill('One fixing lug bent in transit; straightened before mounting.');
    await dialog.getByLabel('Reference area (m²)').fill('0.21');
    await dialog.getByLabel('Reference length (m)').fill('0.9');
    await dialog.getByLabel('Scale', { exact: true }).fill('2');
    await dialog.getByRole('button', { name: 'Record article' }).click();
    await dialog.waitFor({ state: 'detached' });
    await expect.poll(() => page.getByRole('combobox', { name: 'Test article' }).innerText()).toContain(articleName);

    await page.getByRole('combobox', { name: 'Tunnel' }).click();
    await page.getByRole('option').first().click();
    await page.getByRole('button', { name: 'Add a configuration' }).click();
    await page.getByRole('button', { name: 'Add a configuration' }).click();
    const first = page.getByRole('group', { name: 'Configuration 1' });
    const second = page.getByRole('group', { name: 'Configuration 2' });
    await first.getByLabel('Label').fill('fairing on');
    await first.getByLabel('Description').fill('as delivered');
    await second.getByLabel('Label').fill('Fairing on');
    await page.getByRole('button', { name: 'Open test' }).click();
    await page.getByText('Two configurations are labelled "fairing on"').waitFor();
    await second.getByLabel('Label').fill('fairing off');
    await second.getByLabel('Description').fill('bare frame and rider dummy');
    await page.screenshot({ path: `${shots}/open-test-form.png`, fullPage: true });
    await page.getByRole('button', { name: 'Open test' }).click();

    await page.getByRole('heading', { name: title }).waitFor();
    expect(page.url()).toMatch(/\/tests\/[0-9a-f-]{36}$/);
    await page.getByText(/^Planned/).waitFor();
    await page.getByText('No runs yet').waitFor();
    await page.getByRole('link', { name: 'Upload run files' }).click();
    await page.getByRole('button', { name: 'Create run' }).waitFor();
    expect(page.url()).toMatch(/\/upload$/);
  }, 60_000);

  it('the article is listed under its customer and, being used by the test, is kept with the reason when staff try to remove it', async () => {
    const page = await suite.signedIn(demoUser('lab_manager').email);
    await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Test articles' }).click();
    await page.getByRole('heading', { name: 'Test articles' }).waitFor();
    await page.getByRole('combobox', { name: 'Organisation' }).click();
    await page.getByRole('option', { name: demoCustomers.tarnwick }).click();
    const row = page.getByRole('row').filter({ hasText: articleName });
    await row.waitFor();
    expect(await row.innerText()).toContain('Sports equipment');

    await row.getByRole('button', { name: `Remove ${articleName}` }).click();
    await page.getByRole('dialog').getByText('An article that a test uses cannot be removed').waitFor();
    await page.getByRole('dialog').getByRole('button', { name: 'Remove' }).click();
    await page.getByText('Tests refer to this article, so it is kept for their records.').waitFor();
    await row.waitFor();
  }, 60_000);
});
