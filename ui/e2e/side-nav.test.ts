import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createHoistSheet } from './support/api';
import { e2eBaseUrl, e2eSkipReason, launchBrowser, type BrowserSession } from './support/browser';
import { screenshot } from './support/screenshot';
import { signInAs, signOut } from './support/sign-in';

const skipReason = e2eSkipReason();
if (skipReason) console.warn(`[browser] side navigation tests skipped: ${skipReason}`);

describe.skipIf(skipReason !== null)('the side navigation collapses', () => {
  const baseUrl = e2eBaseUrl()!;
  let browser: BrowserSession;
  let sheet: Awaited<ReturnType<typeof createHoistSheet>>;

  beforeAll(async () => {
    browser = await launchBrowser({ width: 1440, height: 900 });
    sheet = await createHoistSheet(baseUrl, 'engineer', `Side nav ${Date.now().toString(36)}`);
    await signInAs(browser.page, baseUrl, 'engineer');
  });
  afterAll(async () => {
    await browser?.close();
  });

  const sheetsLink = () =>
    browser.page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Sheets', exact: true });
  const toggle = () => browser.page.getByTestId('nav-toggle');
  const navInert = () =>
    browser.page.locator('#frame-nav').evaluate((el) => (el as HTMLElement).inert);

  it('starts collapsed in the editor, which then uses the width of a 1440 px screen', async () => {
    const { page } = browser;
    await page.goto(baseUrl + sheet.path);
    await page.locator('[data-check]').first().waitFor();
    await expect.poll(() => toggle().getAttribute('aria-expanded')).toBe('false');
    // Collapsed is inert, not merely moved off screen: Tab and a screen reader both pass it by.
    await expect.poll(() => navInert()).toBe(true);
    const link = (await sheetsLink().boundingBox())!;
    expect(link.x + link.width).toBeLessThanOrEqual(0);
    const inputs = (await page.getByTestId('workbench-inputs').boundingBox())!;
    const results = (await page.getByTestId('workbench-results').boundingBox())!;
    expect(inputs.x).toBeLessThan(60);
    expect(results.x + results.width - inputs.x).toBeGreaterThan(1340);
    await screenshot(page, 'side-nav-editor-1440-collapsed');
  });

  it('opens and closes from the keyboard, and the choice is kept for this user on this device', async () => {
    const { page } = browser;
    await toggle().focus();
    await page.keyboard.press('Enter');
    await expect.poll(() => toggle().getAttribute('aria-expanded')).toBe('true');
    await expect.poll(() => toggle().getAttribute('aria-label')).toBe('Hide navigation');
    await sheetsLink().waitFor();
    expect(await navInert()).toBe(false);
    await page.reload();
    await page.locator('[data-check]').first().waitFor();
    await expect.poll(() => toggle().getAttribute('aria-expanded')).toBe('true');
    await sheetsLink().click();
    await page.getByRole('heading', { name: 'Sheets', exact: true }).waitFor();
    await toggle().focus();
    await page.keyboard.press('Space');
    await expect.poll(() => toggle().getAttribute('aria-expanded')).toBe('false');
    await expect.poll(() => navInert()).toBe(true);
    await page.reload();
    await page.getByRole('heading', { name: 'Sheets', exact: true }).waitFor();
    await expect.poll(() => toggle().getAttribute('aria-expanded')).toBe('false');
    await screenshot(page, 'side-nav-list-1440-collapsed');
  });

  it('another user on the same device starts from the defaults', async () => {
    const { page } = browser;
    await signOut(page);
    await signInAs(page, baseUrl, 'checker');
    await page.goto(`${baseUrl}/sheets`);
    await page.getByRole('heading', { name: 'Sheets', exact: true }).waitFor();
    await expect.poll(() => toggle().getAttribute('aria-expanded')).toBe('true');
    await sheetsLink().waitFor();
  });
});
