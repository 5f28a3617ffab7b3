import type { Page } from 'playwright-core';
import { demoPassword, demoUsers, type DemoUserKey } from './demo-users';

/** Open the sign-in page, sign in as a demo user and wait until the frame shows their name. */
export async function signInAs(page: Page, baseUrl: string, who: DemoUserKey): Promise<void> {
  const user = demoUsers[who];
  await page.goto(`${baseUrl}/sign-in`, { waitUntil: 'domcontentloaded' });
  await page.getByRole('textbox', { name: 'E-mail' }).fill(user.email);
  await page.getByRole('textbox', { name: 'Password' }).fill(demoPassword);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByTestId('current-user-name').filter({ hasText: user.displayName }).waitFor();
}

/** Sign out through the user menu and wait for the sign-in page. */
export async function signOut(page: Page): Promise<void> {
  await page.getByRole('button', { name: /^User menu for/ }).click();
  await page.getByRole('menuitem', { name: 'Sign out' }).click();
  await page.getByRole('heading', { name: 'Sign in' }).waitFor();
}
