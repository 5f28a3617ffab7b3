import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createHoistSheet } from './support/api';
import { e2eBaseUrl, e2eSkipReason, launchBrowser, type BrowserSession } from './support/browser';
import { screenshot } from './support/screenshot';
import { signInAs } from './support/sign-in';

const skipReason = e2eSkipReason();
if (skipReason) console.warn(`[browser] editor layout tests skipped: ${skipReason}`);

describe.skipIf(skipReason !== null)('results stay in view and lead to their inputs', () => {
  const baseUrl = e2eBaseUrl()!;
  let browser: BrowserSession;
  let sheet: Awaited<ReturnType<typeof createHoistSheet>>;

  beforeAll(async () => {
    browser = await launchBrowser({ width: 1440, height: 900 });
    sheet = await createHoistSheet(baseUrl, 'engineer', `Layout ${Date.now().toString(36)}`, {
      start: { kind: 'example' },
    });
    await signInAs(browser.page, baseUrl, 'engineer');
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('at 1440 px the results stay beside the inputs while they scroll', async () => {
    const { page } = browser;
    await page.goto(baseUrl + sheet.path);
    const spring = page.getByRole('textbox', { name: /^Main spring force as set/ });
    await spring.click();
    await spring.press('ControlOrMeta+a');
    await spring.pressSequentially('500', { delay: 20 });
    await page.getByTestId('failing-summary').waitFor();
    const inputs = await page.getByTestId('workbench-inputs').boundingBox();
    const results = await page.getByTestId('workbench-results').boundingBox();
    // Side by side, using the width (no history column at 1440 px).
    expect(results!.x).toBeGreaterThan(inputs!.x + inputs!.width - 1);
    expect(inputs!.width + results!.width).toBeGreaterThan(1100);
    await page.mouse.wheel(0, 4000);
    await page.waitForTimeout(300);
    const heading = await page.getByRole('heading', { name: 'Results', exact: true }).boundingBox();
    expect(heading!.y).toBeGreaterThanOrEqual(0);
    expect(heading!.y).toBeLessThan(900);
    const failing = await page.getByTestId('failing-summary').boundingBox();
    expect(failing!.y + failing!.height).toBeLessThan(900);
    await screenshot(page, 'editor-1440-scrolled');
  });

  it('a failing check links to the inputs that drive it', async () => {
    const { page } = browser;
    await page
      .getByTestId('failing-summary')
      .getByRole('button', { name: /^Inputs that drive/ })
      .first()
      .click();
    const driver = page.locator('[data-driver="springForce"]');
    await driver.waitFor();
    await driver.click();
    await expect
      .poll(() => page.evaluate(() => document.activeElement?.id))
      .toBe('field-springForce');
  });

  it('looks right at 1024 and 390 px', async () => {
    const { page } = browser;
    await page.setViewportSize({ width: 1024, height: 800 });
    await page.goto(baseUrl + sheet.path);
    await page.locator('[data-check]').first().waitFor();
    // A unit picker's chevron sits after the unit's name, not over it.
    const picker = page.getByRole('combobox', { name: /unit$/ }).first();
    const gap = await picker.evaluate((select) => {
      const chevron = select.parentElement!.querySelector('[data-position="right"]')!;
      return chevron.getBoundingClientRect().left - select.getBoundingClientRect().right;
    });
    expect(gap).toBeGreaterThanOrEqual(-30); // its own 18 px section, not the 96 px picker
    await screenshot(page, 'editor-1024');
    await page.setViewportSize({ width: 390, height: 844 });
    await page.goto(baseUrl + sheet.path);
    await page.getByTestId('check-summary-bar').waitFor();
    await page.mouse.wheel(0, 2500);
    await page.waitForTimeout(300);
    const bar = await page.getByTestId('check-summary-bar').boundingBox();
    expect(bar!.y).toBeGreaterThanOrEqual(0);
    expect(bar!.y).toBeLessThan(200);
    // The caution band is fixed at the bottom: all of its words inside it, none clipped.
    const caution = page.getByRole('note', { name: 'Safety caution' });
    const [band, words] = await Promise.all([
      caution.boundingBox(),
      caution.locator('p:visible').boundingBox(),
    ]);
    expect(words!.y + words!.height).toBeLessThanOrEqual(band!.y + band!.height + 1);
    await screenshot(page, 'editor-390');
  });
});
