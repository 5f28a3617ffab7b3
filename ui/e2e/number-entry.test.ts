import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { createHoistSheet, apiClientAs } from './support/api';
import { e2eBaseUrl, e2eSkipReason, launchBrowser, type BrowserSession } from './support/browser';
import { screenshot } from './support/screenshot';
import { signInAs } from './support/sign-in';

const skipReason = e2eSkipReason();
if (skipReason) console.warn(`[browser] number entry tests skipped: ${skipReason}`);

const LEVER = /^Lever ratio/;
const EFFICIENCY = /^Linkage efficiency/;
const ANGLE = /^Contact angle of one shoe/;

/** Clears a field and types into it key by key, as a person does. */
async function typeInto(page: Page, name: RegExp, text: string) {
  const box = page.getByRole('textbox', { name }).first();
  await box.click();
  await box.press('ControlOrMeta+a');
  await box.press('Backspace');
  await box.pressSequentially(text, { delay: 15 });
  return box;
}

/** The saved inputs of the revision, read back from the server. */
async function savedInputs(baseUrl: string, revisionId: string) {
  const call = await apiClientAs(baseUrl, 'engineer');
  const rev = await call<{ inputs: Record<string, unknown> }>('GET', `/revisions/${revisionId}`);
  return rev.inputs;
}

describe.skipIf(skipReason !== null)('number entry, typed key by key', () => {
  const baseUrl = e2eBaseUrl()!;
  let browser: BrowserSession;
  let sheet: Awaited<ReturnType<typeof createHoistSheet>>;

  beforeAll(async () => {
    browser = await launchBrowser({ width: 1440, height: 900 });
    sheet = await createHoistSheet(baseUrl, 'engineer', `Number entry ${Date.now().toString(36)}`);
    await signInAs(browser.page, baseUrl, 'engineer');
  });
  afterAll(async () => {
    const call = await apiClientAs(baseUrl, 'engineer').catch(() => null);
    await call?.('PATCH', '/auth/me', { numberFormat: 'point' }).catch(() => undefined);
    await browser?.close();
  });

  it('keeps the decimal point in unitless fields: 2.5 stays 2.5 and 0.85 stays 0.85', async () => {
    const { page } = browser;
    await page.goto(baseUrl + sheet.path);
    const lever = await typeInto(page, LEVER, '2.5');
    await expect(lever.inputValue()).resolves.toBe('2.5');
    const eff = await typeInto(page, EFFICIENCY, '0.85');
    await expect(eff.inputValue()).resolves.toBe('0.85');
    // Exponents and intermediate states are kept as typed, then read as the number.
    const ratio = await typeInto(page, LEVER, '2.5e0');
    await expect(ratio.inputValue()).resolves.toBe('2.5e0');
    await page.locator('[data-save-status="saved"]').waitFor({ timeout: 15000 });
    await expect
      .poll(async () => (await savedInputs(baseUrl, sheet.revisionId)).leverRatio)
      .toBe(2.5);
    const inputs = await savedInputs(baseUrl, sheet.revisionId);
    expect(inputs.linkageEfficiency).toBe(0.85);
    await screenshot(page, 'number-entry-point');
  });

  it('answers a comma with a plain message in the point format, and out-of-range in degrees', async () => {
    const { page } = browser;
    await typeInto(page, EFFICIENCY, '0,85');
    await page
      .getByText(/Use a point for decimals, e\.g\. 0\.85/)
      .first()
      .waitFor();
    await expect(page.getByText(/is not a power unit|unit ',/).count()).resolves.toBe(0);
    await typeInto(page, EFFICIENCY, '0.9');

    const angle = await typeInto(page, ANGLE, '200');
    await page
      .getByText(/Must be at most 170°\./)
      .first()
      .waitFor();
    await expect(page.getByText(/2\.96705/).count()).resolves.toBe(0);
    await expect(angle.inputValue()).resolves.toBe('200');
    await screenshot(page, 'number-entry-range-message');
    await typeInto(page, ANGLE, '75');
    await expect(page.getByText(/Must be at most 170/).count()).resolves.toBe(0);
  });

  it('reads a decimal comma when the profile says so', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: /^User menu for/ }).click();
    await page.locator('label', { hasText: '2,5 (comma)' }).click();
    await page.keyboard.press('Escape');
    const eff = await typeInto(page, EFFICIENCY, '0,85');
    await expect(eff.inputValue()).resolves.toBe('0,85');
    const lever = await typeInto(page, LEVER, '3,25');
    await expect(lever.inputValue()).resolves.toBe('3,25');
    await page.locator('[data-save-status="saved"]').waitFor({ timeout: 15000 });
    await expect
      .poll(async () => (await savedInputs(baseUrl, sheet.revisionId)).leverRatio)
      .toBe(3.25);
    expect((await savedInputs(baseUrl, sheet.revisionId)).linkageEfficiency).toBe(0.85);
    await screenshot(page, 'number-entry-comma');
  });
});
