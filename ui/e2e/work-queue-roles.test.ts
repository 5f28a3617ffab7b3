import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { e2eBaseUrl, e2eSkipReason, launchBrowser, type BrowserSession } from './support/browser';
import { apiAs } from './support/api';
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

  it('sends a fitter who follows a link to an unapproved revision on to the one in force', async () => {
    // A demo sheet with an approved revision and a newer one not yet approved.
    const list = await apiAs<{
      items: {
        id: string;
        latest: { id: string; state: string };
        approved: { label: string } | null;
      }[];
    }>(baseUrl, 'engineer', 'GET', '/sheets?pageSize=100');
    const sheet = list.items.find((s) => s.approved && s.latest.state !== 'approved');
    expect(sheet, 'the demo has a sheet with a revision after its approved one').toBeTruthy();
    await browser.context.clearCookies();
    await signInAs(browser.page, baseUrl, 'technician');
    await browser.page.goto(`${baseUrl}/sheets/${sheet!.id}/revisions/${sheet!.latest.id}`);
    const inForce = browser.page.getByRole('link', {
      name: `Open revision ${sheet!.approved!.label}, the one in force`,
    });
    await inForce.click();
    await browser.page
      .getByText(/Approved/)
      .first()
      .waitFor();
    expect(browser.page.url()).not.toContain(sheet!.latest.id);
  });
});
