import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import type { Role } from '@tunnelwright/contracts';
import { shots, useBrowserSuite } from './support/browser-suite';
import { demoUser, navLabels } from './support/sign-in';

const expectedNav: Record<Role, string[]> = {
  customer: ['Catalogue', 'Test planner', 'My bookings', 'Tests', 'Documents'],
  technician: ['Catalogue', 'My tunnel time', 'Tests', 'Test articles', 'Import profiles', 'Documents'],
  analyst: ['Catalogue', 'Test planner', 'Tests', 'Test articles', 'Import profiles', 'Documents'],
  lab_manager: ['Catalogue', 'Test planner', 'Bookings', 'Calendar', 'Tests', 'Test articles', 'Import profiles', 'Documents', 'Users', 'Signing rights', 'Tunnels', 'Services', 'Balances', 'Booking rules', 'Audit log', 'Dev mailbox'],
};

describe('signed-in shell', () => {
  const suite = useBrowserSuite();
  let page: Page;

  it.each<Role>(['customer', 'technician', 'analyst', 'lab_manager'])(
    'shows a %s only their own navigation',
    async (role) => {
      const user = demoUser(role);
      page = await suite.signedIn(user.email);
      await expect.poll(() => navLabels(page)).toEqual(expectedNav[role]);
      await expect.poll(() => page.getByRole('button', { name: 'Account menu' }).innerText()).toContain(user.name);
      await page.getByRole('heading', { name: 'Catalogue' }).waitFor();
      await page.getByText('Services and rates').waitFor();
      await page.locator('tw-catalogue-page mat-progress-bar').waitFor({ state: 'detached' });
      await page.screenshot({ path: `${shots}/shell-${role}.png`, fullPage: true });
    },
  );

  it('turns a customer away from staff pages', async () => {
    page = await suite.signedIn(demoUser('customer').email);
    for (const staffPath of ['/admin/users', '/admin/tunnels', '/dev-mailbox']) {
      await page.goto(`${suite.api.baseUrl}${staffPath}`);
      await page.getByRole('heading', { name: 'This part of Tunnelwright is for laboratory staff' }).waitFor();
      expect(new URL(page.url()).pathname).toBe('/not-allowed');
    }
    await page.screenshot({ path: `${shots}/not-allowed-customer.png` });
    await page.getByRole('link', { name: 'Back to the catalogue' }).click();
    await page.getByRole('heading', { name: 'Catalogue' }).waitFor();
  });

  it('keeps the session across a reload through the refresh cookie', async () => {
    page = await suite.signedIn(demoUser('analyst').email);
    await page.reload();
    await page.getByRole('navigation', { name: 'Sections' }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/catalogue');
  });

  it('signs out, and the old session no longer opens pages', async () => {
    page = await suite.signedIn(demoUser('technician').email);
    await page.getByRole('button', { name: 'Account menu' }).click();
    await page.getByRole('menuitem', { name: 'Sign out' }).click();
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/sign-in');

    await page.goto(`${suite.api.baseUrl}/catalogue`);
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    expect(new URL(page.url()).searchParams.get('returnUrl')).toBe('/catalogue');
  });

  it('answers an unknown address with the not-found page', async () => {
    page = await suite.browser.freshPage();
    await page.goto(`${suite.api.baseUrl}/no-such-page`);
    await page.getByRole('heading', { name: 'We could not find that page' }).waitFor();
  });

  it('shows why a sign-in failed', async () => {
    page = await suite.browser.freshPage();
    await page.goto(`${suite.api.baseUrl}/sign-in`);
    await page.getByLabel('E-mail').fill(demoUser('customer').email);
    await page.getByLabel('Password').fill('certainly-not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect.poll(() => page.getByRole('alert').innerText()).not.toBe('');
    await page.screenshot({ path: `${shots}/sign-in-failed.png` });
  });
});
