import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { demoUsers } from '../../../scripts/seed/demo-users';
import { shots, useBrowserSuite } from './support/browser-suite';

async function pickOption(page: Page, comboboxName: string, option: string): Promise<void> {
  await page.getByRole('combobox', { name: comboboxName }).click();
  await page.getByRole('option', { name: option, exact: true }).click();
}

describe('test planner', () => {
  const suite = useBrowserSuite();

  it('a customer builds a three-part plan, sees the checks for a tunnel with the caution, saves it and attaches it to a booking request', async () => {
    const customer = demoUsers.find((person) => person.email === 'customer@quillfen.example');
    if (!customer) throw new Error('The demo seed has no Quillfen customer');
    const page = await suite.signedIn(customer.email);
    await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Test planner' }).click();
    await page.getByRole('heading', { name: 'Test planner', level: 1 }).waitFor();
    // The seeded plan of the customer's own organisation is listed; the other customer's is not.
    await page.getByRole('link', { name: /Inspection trolley with rider/ }).waitFor();
    expect(await page.getByText('Solar frame on a transport trailer').count()).toBe(0);
    await page.getByText('Nothing to estimate yet').waitFor();

    const name = `Street lamp pair ${Date.now().toString(36)}`;
    await page.getByLabel('Plan name').fill(name);
    const parts = page.getByRole('list', { name: 'Parts' }).getByRole('listitem');

    await pickOption(page, 'Part 1 shape', 'Sphere');
    await parts.nth(0).getByLabel('Diameter (m)').fill('0.2');
    await parts.nth(0).getByLabel('Count').fill('2');
    await parts.nth(0).getByText('Reference area: π × diameter² / 4').waitFor();

    await page.getByRole('button', { name: 'Add part' }).click();
    await pickOption(page, 'Part 2 shape', 'Circular cylinder in cross-flow');
    await parts.nth(1).getByLabel('Length (m)').fill('1');
    await parts.nth(1).getByLabel('Diameter (m)').fill('0.05');

    await page.getByRole('button', { name: 'Add part' }).click();
    await pickOption(page, 'Part 3 shape', 'Custom part with a known C_D·A');
    await parts.nth(2).getByLabel('Part name').fill('Mounting box');
    await parts.nth(2).getByLabel('Drag area C_D·A per item (m²)').fill('0.05');

    await pickOption(page, 'Tunnel', 'Tunnel 1 — closed section · 2.9 m², up to 55 m/s');
    // The catalogue lists the balance fitted in this tunnel; this plan checks against a smaller capacity typed in.
    await page.getByRole('button', { name: /^Use SIX-COMPONENT 01, fitted in this tunnel: Fx \d+ N$/ }).waitFor();
    await page.getByLabel('Balance drag capacity (N)').fill('300');

    await page.getByRole('heading', { name: /Fit in Tunnel 1 — closed section: \d+ pass/ }).waitFor();
    await page.getByText('Planning estimate only, not a design value', { exact: false }).first().waitFor();
    const checks = page.locator('li.check');
    expect(await checks.count()).toBeGreaterThan(5);
    expect(await page.locator('li.check[data-status="pass"]').count()).toBeGreaterThan(0);
    expect(await page.getByRole('row', { name: /Mounting box/ }).count()).toBe(1);
    await page.getByRole('heading', { name: /Tunnel time: 2 h/ }).waitFor();
    await page.screenshot({ path: `${shots}/planner-three-parts.png`, fullPage: true });

    await page.getByRole('button', { name: 'Save plan' }).click();
    await page.getByRole('status').filter({ hasText: `Saved “${name}” as version 1.` }).waitFor();
    await page.getByRole('link', { name: new RegExp(name) }).waitFor();

    await page.getByRole('button', { name: 'Save new version' }).click();
    await page.getByRole('status').filter({ hasText: 'as version 2.' }).waitFor();
    // Both versions are kept and listed, newest first.
    await page.getByRole('button', { name: 'Load version 1 into the editor' }).waitFor();
    await page.getByRole('button', { name: 'Load version 2 into the editor' }).waitFor();

    // The plan goes with a booking request: its tunnel hours set the end of the period asked for.
    await page.getByRole('link', { name: 'Use for a booking request' }).click();
    await page.getByRole('heading', { name: 'Request tunnel time' }).waitFor();
    await page.getByRole('combobox', { name: 'Saved test plan' }).getByText(name).waitFor();
    await page.getByTestId('plan-duration').getByText(/2 h of tunnel time/).waitFor();
    await page.getByRole('progressbar', { name: 'Loading tunnels' }).waitFor({ state: 'detached' });
    await pickOption(page, 'Tunnel', 'Tunnel 1 — closed section');
    const day = new Date(Date.now() + 120 * 86_400_000).toISOString().slice(0, 10);
    await page.getByLabel('Start', { exact: true }).fill(`${day}T09:00`);
    await expect.poll(() => page.getByLabel('End', { exact: true }).inputValue()).toBe(`${day}T11:00`);
    const article = `Signal gantry model ${Date.now().toString(36)}`;
    await page.getByLabel('Article name').fill(article);
    await page.getByRole('combobox', { name: 'Coefficients based on' }).focus();
    await page.keyboard.press('Enter');
    await page.getByRole('option', { name: 'Frontal area', exact: true }).click();
    await page.getByRole('button', { name: 'Send request' }).click();
    await page.getByRole('heading', { name: 'My bookings', level: 1 }).waitFor();
    await page.locator('tw-booking-summary').filter({ hasText: article }).getByText('Requested', { exact: true }).waitFor();
  });
});
