import type { Role } from '@tunnelwright/contracts';
import type { Page } from 'playwright-core';
import { demoPassword, demoUsers, type DemoUser } from '../../../../scripts/seed/demo-users';

/** Signs in through the real form and waits for the signed-in shell. */
export async function signIn(page: Page, baseUrl: string, email: string, password = demoPassword): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('navigation', { name: 'Sections' }).waitFor();
}

/** The labels of the side navigation, in order. */
export async function navLabels(page: Page): Promise<string[]> {
  const titles = page.getByRole('navigation', { name: 'Sections' }).locator('a .mat-mdc-list-item-title');
  return (await titles.allInnerTexts()).map((text) => text.trim());
}

/** The demo account of a role; for a customer, of the named organisation if one is given, else the first. */
export function demoUser(role: Role, organisation?: string): DemoUser {
  const user = demoUsers.find((candidate) => candidate.role === role && (organisation === undefined || candidate.organisation === organisation));
  if (!user) {
    throw new Error(`The demo seed has no ${role}${organisation ? ` of ${organisation}` : ''}`);
  }
  return user;
}
