import { describe, expect, it } from 'vitest';
import { demoCustomers } from '../../../scripts/seed/demo-users';
import { shots, useBrowserSuite } from './support/browser-suite';
import { demoUser, navLabels } from './support/sign-in';

describe('invitation path', () => {
  const suite = useBrowserSuite();

  it('a lab manager invites a customer, who follows the mailed link, sets a password and is signed in', async () => {
    const manager = demoUser('lab_manager');
    const stamp = Date.now().toString(36);
    const email = `wren.halloway.${stamp}@quillfen.example`;
    const name = `Wren Halloway ${stamp}`;
    const page = await suite.signedIn(manager.email);
    await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Users' }).click();
    await page.getByRole('heading', { name: 'Users' }).waitFor();
    await page.getByRole('button', { name: 'Invite someone' }).click();

    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('E-mail').fill(email);
    await dialog.getByLabel('Name').fill(name);
    await dialog.getByRole('combobox', { name: 'Organisation' }).click();
    await page.getByRole('option', { name: demoCustomers.quillfen }).click();
    await expect.poll(() => dialog.getByRole('combobox', { name: 'Role' }).innerText()).toContain('Customer');
    await page.getByRole('listbox').waitFor({ state: 'detached' });
    await page.screenshot({ path: `${shots}/invite-dialog.png` });
    await dialog.getByRole('button', { name: 'Send invitation' }).click();
    await page.getByText(`Invitation sent to ${email}.`).waitFor();

    await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Dev mailbox' }).click();
    await page.getByRole('heading', { name: 'Dev mailbox' }).waitFor();
    const message = page.locator('mat-expansion-panel').filter({ hasText: email }).first();
    await message.waitFor();
    await page.screenshot({ path: `${shots}/dev-mailbox.png`, fullPage: true });
    await message.locator('.links a').first().click();

    await page.getByRole('heading', { name: 'Welcome to Tunnelwright' }).waitFor();
    await page.getByText(email).waitFor();
    await page.getByLabel('New password').fill('Copper-Heron-Drifts-Quietly-58');
    await page.getByLabel('Repeat the password').fill('Copper-Heron-Drifts-Quietly-58');
    await page.getByText(/Strength: (Strong|Very strong)/).waitFor();
    await page.screenshot({ path: `${shots}/accept-invitation.png` });
    await page.getByRole('button', { name: 'Set password and sign in' }).click();

    await page.getByRole('navigation', { name: 'Sections' }).waitFor();
    await expect.poll(() => page.getByRole('button', { name: 'Account menu' }).innerText()).toContain(name);
    expect(await navLabels(page)).toEqual(expect.arrayContaining(['Catalogue', 'Test planner']));

    // The link is single-use: opening it again explains what happened.
    await page.goBack();
    await page.getByText('This link was already used or has expired').waitFor();
  });
});
