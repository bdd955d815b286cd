import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { useBrowserSuite } from './support/browser-suite';

const plan = 'Estate car, full-size estimate';
const caution = 'Planning estimate only, not a design value';

async function openPlan(page: Page): Promise<void> {
  await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Test planner' }).click();
  await page.getByRole('link', { name: new RegExp(plan) }).click();
  await page.getByRole('heading', { name: 'Certified result' }).waitFor();
}

describe('certified result on a plan', () => {
  const suite = useBrowserSuite();

  it('the analyst unlinks the seeded sheet after confirming and links it again; the customer then sees the comparison with the caution', async () => {
    const analyst = await suite.signedIn('analyst@brackenmoor.example');
    await openPlan(analyst);
    const panel = analyst.getByRole('region', { name: 'Certified result' });
    await panel.getByText(/BAL-\d{4}-\d{4}-R2, configuration A/).first().waitFor();
    await panel.getByText(caution, { exact: false }).waitFor();

    await panel.getByRole('button', { name: 'Unlink' }).click();
    const dialog = analyst.getByRole('dialog');
    await dialog.getByRole('heading', { name: 'Unlink the certified result?' }).waitFor();
    await dialog.getByRole('button', { name: 'Unlink' }).click();
    await panel.getByRole('heading', { name: 'Link a result sheet' }).waitFor();

    // Only the valid revision is offered; R1 is superseded.
    await panel.getByRole('combobox', { name: 'Result sheet' }).click();
    const options = analyst.getByRole('option');
    expect(await options.allInnerTexts()).toEqual([expect.stringMatching(/^BAL-\d{4}-\d{4}-R2 · Estate car yaw sweep/)]);
    await options.first().click();
    await panel.getByText(/Takes the point at yaw 0\.0° \(nearest 0°\)/).waitFor();
    await panel.getByRole('button', { name: 'Link' }).click();
    await panel.getByText(/by Daniel Okonjo-Vale/).waitFor();

    const customer = await suite.signedIn('customer@quillfen.example');
    await openPlan(customer);
    const seen = customer.getByRole('region', { name: 'Certified result' });
    await seen.getByText(/BAL-\d{4}-\d{4}-R2, configuration A/).first().waitFor();
    await seen.getByText(/(above|below) the measured value by/).waitFor();
    await seen.getByText(caution, { exact: false }).waitFor();
    expect(await seen.getByRole('button', { name: 'Unlink' }).count()).toBe(0);
  });
});
