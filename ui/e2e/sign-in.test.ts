import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { e2eBaseUrl, e2eSkipReason, launchBrowser, type BrowserSession } from './support/browser';
import { demoUsers, type DemoUserKey } from './support/demo-users';
import { screenshot } from './support/screenshot';
import { signInAs, signInWithForm, signOut } from './support/sign-in';

const skipReason = e2eSkipReason();
if (skipReason) console.warn(`[browser] sign-in tests skipped: ${skipReason}`);

describe.skipIf(skipReason !== null)('sign-in in a real browser', () => {
  const baseUrl = e2eBaseUrl()!;
  let browser: BrowserSession;

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('shows field errors and refuses a wrong password', async () => {
    const { page } = browser;
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByText('not a valid e-mail address').isVisible()).resolves.toBe(true);

    await page.getByRole('textbox', { name: 'E-mail' }).pressSequentially(demoUsers.engineer.email);
    await page.getByRole('textbox', { name: 'Password' }).pressSequentially('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    const alert = page.getByRole('alert').filter({ hasText: /sign|password|credential/i });
    await alert.first().waitFor();
    await screenshot(page, 'sign-in-refused');
  });

  for (const who of Object.keys(demoUsers) as DemoUserKey[]) {
    it(`signs in as ${who} and sees their name`, async () => {
      const { page } = browser;
      const user = demoUsers[who];
      await signInWithForm(page, baseUrl, who);
      await expect(page.getByTestId('current-user-name').textContent()).resolves.toBe(
        user.displayName,
      );
      const usersLink = page.getByRole('link', { name: 'Users' });
      await expect(usersLink.count()).resolves.toBe(user.role === 'admin' ? 1 : 0);
      await screenshot(page, `frame-${who}`);
      if (who === 'admin') {
        await usersLink.click();
        await page.getByRole('heading', { name: 'Users' }).waitFor();
        await page.getByRole('cell', { name: demoUsers.viewer.email }).waitFor();
        await screenshot(page, 'admin-users');
      }
      await signOut(page);
    });
  }

  it('lets an admin add a user who can then sign in, and deactivate them again', async () => {
    const { page } = browser;
    const email = `e2e.${Date.now()}@holdfast.test`;
    const password = 'a-long-first-password';
    await signInAs(page, baseUrl, 'admin');
    await page.getByRole('link', { name: 'Users' }).click();
    await page.getByRole('button', { name: 'New user' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByRole('textbox', { name: 'E-mail' }).pressSequentially(email);
    await dialog.getByRole('textbox', { name: 'Display name' }).pressSequentially('Noor Haddad');
    await dialog.getByRole('textbox', { name: 'Display name' }).blur();
    await expect(dialog.getByRole('textbox', { name: 'Initials' }).inputValue()).resolves.toBe(
      'NH',
    );
    await dialog.getByRole('textbox', { name: 'First password' }).pressSequentially(password);
    await screenshot(page, 'admin-new-user');
    await dialog.getByRole('button', { name: 'Create user' }).click();
    await page.getByRole('cell', { name: email }).waitFor();
    await signOut(page);

    await page.getByRole('textbox', { name: 'E-mail' }).pressSequentially(email);
    await page.getByRole('textbox', { name: 'Password' }).pressSequentially(password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByTestId('current-user-name').filter({ hasText: 'Noor Haddad' }).waitFor();
    await signOut(page);

    await signInAs(page, baseUrl, 'admin');
    await page.goto(`${baseUrl}/admin/users`);
    await page.getByRole('button', { name: 'Deactivate Noor Haddad' }).click();
    await page.getByRole('button', { name: 'Reactivate Noor Haddad' }).waitFor();
    await signOut(page);

    await page.getByRole('textbox', { name: 'E-mail' }).pressSequentially(email);
    await page.getByRole('textbox', { name: 'Password' }).pressSequentially(password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page
      .getByRole('alert')
      .filter({ hasText: /not signed in/i })
      .waitFor();
  });

  it('keeps the session across a reload and shows a 404 inside the frame', async () => {
    const { page } = browser;
    await signInAs(page, baseUrl, 'checker');
    await page.goto(`${baseUrl}/no-such-page`);
    await page.getByRole('heading', { name: 'Not found' }).waitFor();
    await expect(page.getByTestId('current-user-name').textContent()).resolves.toBe(
      demoUsers.checker.displayName,
    );
    await screenshot(page, 'not-found');
    await signOut(page);
    await page.goto(`${baseUrl}/sheets`);
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    expect(new URL(page.url()).searchParams.get('next')).toBe('/sheets');
    // Signed out by choice, then a deep link: nothing expired, so the page does not say so.
    await page.waitForLoadState('networkidle');
    await expect(page.getByText(/session has ended/).count()).resolves.toBe(0);
    await screenshot(page, 'sign-in');
  });
});
