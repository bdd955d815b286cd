import type { Page } from 'playwright-core';
import { demoPassword } from '../../../../scripts/seed/demo-users';

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
