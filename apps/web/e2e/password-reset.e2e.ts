import { describe, expect, it } from 'vitest';
import { demoCustomers } from '../../../scripts/seed/demo-users';
import { useBrowserSuite } from './support/browser-suite';
import { demoUser, signIn } from './support/sign-in';

describe('forgotten password and profile', () => {
  const suite = useBrowserSuite();

  it('a customer resets a forgotten password through the mailed link, signs in with it and renames themself', async () => {
    const customer = demoUser('customer', demoCustomers.tarnwick);
    const manager = demoUser('lab_manager');
    const newPassword = 'Saffron-Kettle-Moorland-29';

    let page = await suite.browser.freshPage();
    await page.goto(`${suite.api.baseUrl}/sign-in`);
    await page.getByRole('link', { name: 'Forgotten your password?' }).click();
    // The page is lazy-loaded: typing before it has replaced the sign-in form would fill the wrong field.
    await page.waitForURL(/\/forgot-password$/);
    await page.getByText('Enter the e-mail you sign in with').waitFor();
    await page.getByLabel('E-mail').fill(customer.email);
    await page.getByRole('button', { name: 'Send link' }).click();
    await page.getByText('If an account uses that address').waitFor();

    // Demo mode: the lab manager's dev mailbox shows what was sent.
    page = await suite.signedIn(manager.email);
    await page.goto(`${suite.api.baseUrl}/dev-mailbox`);
    const message = page.locator('mat-expansion-panel').filter({ hasText: customer.email }).first();
    await message.waitFor();
    const link = await message.locator('.links a').first().getAttribute('href');
    expect(link).toMatch(/\/reset-password\?token=/);

    page = await suite.browser.freshPage();
    await page.goto(link ?? '');
    await page.getByRole('heading', { name: 'Choose a new password' }).waitFor();
    await page.getByLabel('New password').fill(newPassword);
    await page.getByLabel('Repeat the password').fill('Saffron-Kettle-Moorland-30');
    await page.getByRole('button', { name: 'Change password' }).click();
    await page.getByText('The two passwords are not the same').waitFor();
    await page.getByLabel('Repeat the password').fill(newPassword);
    await page.getByRole('button', { name: 'Change password' }).click();
    await page.getByText('Your password has been changed').waitFor();

    await signIn(page, suite.api.baseUrl, customer.email, newPassword);
    await page.getByRole('button', { name: 'Account menu' }).click();
    await page.getByRole('menuitem', { name: 'Profile' }).click();
    await page.getByRole('heading', { name: 'Your profile' }).waitFor();
    await page.getByLabel('Name').fill('Tobias R. Enderby');
    await page.getByRole('button', { name: 'Save name' }).click();
    await page.getByText('Your name has been saved.').waitFor();
    await expect.poll(() => page.getByRole('button', { name: 'Account menu' }).innerText()).toContain('Tobias R. Enderby');
  });
});
