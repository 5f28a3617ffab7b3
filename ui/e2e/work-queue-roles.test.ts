import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { e2eBaseUrl, e2eSkipReason, launchBrowser, type BrowserSession } from './support/browser';
import { screenshot } from './support/screenshot';
import { signInAs } from './support/sign-in';

const skipReason = e2eSkipReason();
if (skipReason) console.warn(`[browser] work queue tests skipped: ${skipReason}`);

const sectionsOf = async (session: BrowserSession) => {
  await session.page.getByRole('heading', { name: 'Work queue' }).waitFor();
  await session.page.locator('[data-queue]').first().waitFor();
  return session.page
    .locator('[data-queue]')
    .evaluateAll((els) => els.map((e) => e.getAttribute('data-queue')));
};

/** Issue 11 item 11: each role's queue shows only what that role acts on. */
describe.skipIf(skipReason !== null)('work queue by role', () => {
  const baseUrl = e2eBaseUrl()!;
  let browser: BrowserSession;
  beforeAll(async () => {
    browser = await launchBrowser({ width: 1280, height: 900 });
  });
  afterAll(async () => {
    await browser?.close();
  });

  const cases = [
    ['viewer', ['approved']],
    ['engineer', ['returned', 'drafts', 'approved']],
    ['checker', ['check', 'returned', 'drafts', 'approved']],
    ['admin', ['admin']],
    ['technician', ['approved']],
  ] as const;

  for (const [who, expected] of cases) {
    it(`${who} sees ${expected.join(', ')}`, async () => {
      await browser.context.clearCookies();
      await signInAs(browser.page, baseUrl, who);
      expect(await sectionsOf(browser)).toEqual(expected);
      if (who === 'viewer') {
        await browser.page.getByRole('heading', { name: /print into the safety file/ }).waitFor();
        await expect(browser.page.getByText('My drafts').count()).resolves.toBe(0);
      }
      if (who === 'technician') {
        // A fitter authors nothing: the list is every new approval, which the demo has.
        await browser.page.getByRole('heading', { name: /brakes to set/ }).waitFor();
        await browser.page.locator('[data-queue="approved"] li a').first().waitFor();
      }
      await screenshot(browser.page, `queue-${who}`);
    });
  }
});
