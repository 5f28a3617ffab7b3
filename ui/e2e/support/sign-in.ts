import type { Page } from 'playwright-core';
import { demoPassword, demoUsers, type DemoUserKey } from './demo-users';

/**
 * Sign in as a demo user for a test whose subject is not signing in: the session is started by
 * the same API call the form makes (through the page's own request context, so the browser keeps
 * the refresh cookie), then the app is opened on the work queue and the frame shows the name.
 * The same end state as the form at about half the browser work; sign-in.test.ts types the form.
 */
export async function signInAs(page: Page, baseUrl: string, who: DemoUserKey): Promise<void> {
  const user = demoUsers[who];
  const res = await page.request.post(`${baseUrl}/api/auth/sign-in`, {
    data: { email: user.email, password: demoPassword },
  });
  if (!res.ok()) throw new Error(`sign-in as ${who} gave ${res.status()}: ${await res.text()}`);
  await page.goto(`${baseUrl}/`, { waitUntil: 'domcontentloaded' });
  await page.getByTestId('current-user-name').filter({ hasText: user.displayName }).waitFor();
}

/** Open the sign-in page, type the e-mail and password key by key and wait until the frame shows the name. */
export async function signInWithForm(page: Page, baseUrl: string, who: DemoUserKey): Promise<void> {
  const user = demoUsers[who];
  await page.goto(`${baseUrl}/sign-in`, { waitUntil: 'domcontentloaded' });
  await page.getByRole('textbox', { name: 'E-mail' }).pressSequentially(user.email);
  await page.getByRole('textbox', { name: 'Password' }).pressSequentially(demoPassword);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByTestId('current-user-name').filter({ hasText: user.displayName }).waitFor();
}

/** Sign out through the user menu and wait for the sign-in page. */
export async function signOut(page: Page): Promise<void> {
  await page.getByRole('button', { name: /^User menu for/ }).click();
  await page.getByRole('menuitem', { name: 'Sign out' }).click();
  await page.getByRole('heading', { name: 'Sign in' }).waitFor();
}
