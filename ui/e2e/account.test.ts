import { randomBytes } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { e2eBaseUrl, e2eSkipReason, launchBrowser, type BrowserSession } from './support/browser';
import { demoPassword, demoUsers } from './support/demo-users';
import { screenshot } from './support/screenshot';
import { signInAs, signOut } from './support/sign-in';

const skipReason = e2eSkipReason();
if (skipReason) console.warn(`[browser] account tests skipped: ${skipReason}`);

/** A user of its own for this run, so changing its password disturbs no other test. */
async function createUser(baseUrl: string, password: string) {
  const signIn = await fetch(`${baseUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: demoUsers.admin.email, password: demoPassword }),
  });
  const { accessToken } = (await signIn.json()) as { accessToken: string };
  const email = `pw-${randomBytes(4).toString('hex')}@holdfast.test`;
  const res = await fetch(`${baseUrl}/api/users`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', authorization: `Bearer ${accessToken}` },
    body: JSON.stringify({
      email,
      displayName: 'Rhea Stone',
      initials: 'RS',
      role: 'viewer',
      password,
    }),
  });
  expect(res.status).toBe(201);
  return email;
}

describe.skipIf(skipReason !== null)('account and password in a real browser', () => {
  const baseUrl = e2eBaseUrl()!;
  let browser: BrowserSession;

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('changes the own password from the user menu, and the new one signs in', async () => {
    const { page } = browser;
    await page.context().clearCookies();
    const first = 'granite willow harbour tune';
    const second = 'copper lantern orbit meadow';
    const email = await createUser(baseUrl, first);
    const signIn = async (password: string) => {
      await page.goto(`${baseUrl}/sign-in`, { waitUntil: 'domcontentloaded' });
      await page.getByRole('textbox', { name: 'E-mail' }).pressSequentially(email);
      await page.getByRole('textbox', { name: 'Password' }).pressSequentially(password);
      await page.getByRole('button', { name: 'Sign in' }).click();
    };
    await signIn(first);
    await page.getByTestId('current-user-name').filter({ hasText: 'Rhea Stone' }).waitFor();

    await page.getByRole('button', { name: /^User menu for/ }).click();
    await page.getByRole('menuitem', { name: 'Account and password' }).click();
    await page.getByRole('heading', { name: 'Your account' }).waitFor();
    await page.getByLabel('Current password').pressSequentially(first);
    await page.getByLabel(/^New password/).pressSequentially('password1234');
    await page.getByLabel('Repeat the new password').pressSequentially('password1234');
    await page.getByRole('button', { name: 'Change password' }).click();
    await page.getByText(/too easy to guess/).waitFor();
    await screenshot(page, 'account-password-refused');

    await page.getByLabel(/^New password/).fill('');
    await page.getByLabel('Repeat the new password').fill('');
    await page.getByLabel(/^New password/).pressSequentially(second);
    await page.getByLabel('Repeat the new password').pressSequentially(second);
    await page.getByRole('button', { name: 'Change password' }).click();
    await page.getByText('Password changed').waitFor();

    await signOut(page);
    await signIn(first);
    await page.getByRole('alert').first().waitFor();
    await page.getByRole('textbox', { name: 'Password' }).fill('');
    await page.getByRole('textbox', { name: 'Password' }).pressSequentially(second);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByTestId('current-user-name').filter({ hasText: 'Rhea Stone' }).waitFor();
    await signOut(page);
  });

  it('shows the admin the undelivered mail screen and a reset button per user', async () => {
    const { page } = browser;
    await page.context().clearCookies();
    await signInAs(page, baseUrl, 'admin');
    await page.getByRole('link', { name: 'Undelivered mail' }).click();
    await page.getByRole('heading', { name: 'Undelivered mail' }).waitFor();
    await page
      .getByText(/No undelivered mail|Send again/)
      .first()
      .waitFor();
    await screenshot(page, 'admin-undelivered-mail');
    await page.getByRole('link', { name: 'Users' }).click();
    const reset = page.getByRole('button', {
      name: `Reset password of ${demoUsers.viewer.displayName}`,
    });
    await reset.waitFor();
    await reset.click();
    await page
      .getByRole('button', { name: `Confirm password reset for ${demoUsers.viewer.displayName}` })
      .waitFor();
    // Not confirmed: leaving the button disarms it, and the viewer keeps their password.
    await page.getByRole('heading', { name: 'Users' }).click();
    await reset.waitFor();
    await signOut(page);
  });
});
