import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { apiClientAs, createHoistSheet } from './support/api';
import { e2eBaseUrl, e2eSkipReason, launchBrowser, type BrowserSession } from './support/browser';
import { screenshot } from './support/screenshot';
import { signInAs } from './support/sign-in';

const skipReason = e2eSkipReason();
if (skipReason) console.warn(`[browser] editor saving tests skipped: ${skipReason}`);

const DRUM = /^Brake drum diameter/;
const WIDTH = /^Lining width/;
const EFFICIENCY = /^Linkage efficiency/;

async function typeInto(page: Page, name: RegExp, text: string) {
  const box = page.getByRole('textbox', { name }).first();
  await box.click();
  await box.press('ControlOrMeta+a');
  await box.press('Backspace');
  await box.pressSequentially(text, { delay: 15 });
  return box;
}

describe.skipIf(skipReason !== null)('the editor never loses an edit', () => {
  const baseUrl = e2eBaseUrl()!;
  let browser: BrowserSession;
  let sheet: Awaited<ReturnType<typeof createHoistSheet>>;
  const saved = async () => {
    const call = await apiClientAs(baseUrl, 'engineer');
    return (
      await call<{ inputs: Record<string, { value: number } | number | string> }>(
        'GET',
        `/revisions/${sheet.revisionId}`,
      )
    ).inputs;
  };

  beforeAll(async () => {
    browser = await launchBrowser({ width: 1440, height: 900 });
    sheet = await createHoistSheet(baseUrl, 'engineer', `Never lose ${Date.now().toString(36)}`, {
      start: { kind: 'example' },
    });
    await signInAs(browser.page, baseUrl, 'engineer');
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('an invalid field keeps its text and message while the other fields save', async () => {
    const { page } = browser;
    await page.goto(baseUrl + sheet.path);
    const drum = await typeInto(page, DRUM, '4x0');
    await typeInto(page, EFFICIENCY, '0.9');
    await page.locator('[data-save-status="saved"]').waitFor({ timeout: 15000 });
    await expect.poll(async () => (await saved()).linkageEfficiency).toBe(0.9);
    expect((await saved()).drumDiameter).toEqual({ value: 400, unit: 'mm' });
    await expect(drum.inputValue()).resolves.toBe('4x0');
    await page
      .getByText(/still to correct/)
      .first()
      .waitFor();
    await screenshot(page, 'editor-invalid-field-others-saved');
  });

  it('a reload offers back the text the server never took, and restores it', async () => {
    const { page } = browser;
    await typeInto(page, WIDTH, '155');
    // No waiting: the page goes away at once (the pagehide save and the device copy must cover it).
    await page.reload();
    await page.getByTestId('local-draft-offer').waitFor();
    await expect.poll(async () => (await saved()).shoeWidth).toEqual({ value: 155, unit: 'mm' });
    await screenshot(page, 'editor-local-offer');
    await page.getByRole('button', { name: 'Restore my edits' }).click();
    await expect(page.getByRole('textbox', { name: DRUM }).inputValue()).resolves.toBe('4x0');
    await expect(page.getByRole('textbox', { name: WIDTH }).inputValue()).resolves.toBe('155');
    await typeInto(page, DRUM, '410');
    await page.locator('[data-save-status="saved"]').waitFor({ timeout: 15000 });
    await expect.poll(async () => (await saved()).drumDiameter).toEqual({ value: 410, unit: 'mm' });
  });

  it('edits typed as the session expires come back after signing in again', async () => {
    const { page, context } = browser;
    await page.goto(baseUrl + sheet.path);
    await page.getByRole('textbox', { name: WIDTH }).waitFor();
    // The session ends: every API call is refused and the refresh cookie is gone. The refusals
    // are held until the last key is typed: on a loaded machine a pause between two keys can pass
    // the autosave delay, and the sign-in page would then take the remaining keys.
    await context.clearCookies();
    let typed = () => {};
    const typing = new Promise<void>((resolve) => (typed = resolve));
    await page.route('**/api/revisions/**', async (route) => {
      await typing;
      await route.fulfill({
        status: 401,
        body: '{"error":{"code":"unauthenticated","message":"x"}}',
      });
    });
    await typeInto(page, WIDTH, '165');
    typed();
    await page.getByRole('button', { name: 'Sign in' }).waitFor({ timeout: 15000 });
    await page.unroute('**/api/revisions/**');
    expect((await saved()).shoeWidth).toEqual({ value: 155, unit: 'mm' });
    await signInAs(page, baseUrl, 'engineer');
    await page.goto(baseUrl + sheet.path);
    await page.getByTestId('local-draft-offer').waitFor();
    await page.getByRole('button', { name: 'Restore my edits' }).click();
    await expect(page.getByRole('textbox', { name: WIDTH }).inputValue()).resolves.toBe('165');
    await expect
      .poll(async () => (await saved()).shoeWidth, { timeout: 15000 })
      .toEqual({ value: 165, unit: 'mm' });
  });
});
