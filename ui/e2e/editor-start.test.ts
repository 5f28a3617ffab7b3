import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { e2eBaseUrl, e2eSkipReason, launchBrowser, type BrowserSession } from './support/browser';
import { screenshot } from './support/screenshot';
import { signInAs } from './support/sign-in';

const skipReason = e2eSkipReason();
if (skipReason) console.warn(`[browser] sheet start tests skipped: ${skipReason}`);

async function newSheet(page: Page, baseUrl: string, title: string, start: RegExp) {
  await page.goto(`${baseUrl}/sheets`);
  await page.getByRole('button', { name: 'New sheet' }).click();
  const dialog = page.getByRole('dialog', { name: 'New calculation sheet' });
  await dialog.getByPlaceholder('Choose a position').click();
  await page.getByRole('option', { name: /^MH-B2/ }).click();
  await dialog.getByRole('textbox', { name: /^Title/ }).pressSequentially(title);
  await dialog.getByRole('radio', { name: start }).check();
  await screenshot(page, `start-dialog-${title.split(' ')[0]!.toLowerCase()}`);
  await dialog.getByRole('button', { name: 'Create sheet' }).click();
  await page.getByRole('heading', { name: title }).waitFor();
}

describe.skipIf(skipReason !== null)('starting a sheet honestly', () => {
  const baseUrl = e2eBaseUrl()!;
  let browser: BrowserSession;

  beforeAll(async () => {
    browser = await launchBrowser({ width: 1440, height: 900 });
    await signInAs(browser.page, baseUrl, 'engineer');
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('an empty sheet shows required fields blank until entered', async () => {
    const { page } = browser;
    await newSheet(page, baseUrl, `Empty start ${Date.now().toString(36)}`, /^An empty sheet/);
    const drum = page.getByRole('textbox', { name: /^Brake drum diameter/ });
    await expect(drum.inputValue()).resolves.toBe('');
    await expect(drum.getAttribute('placeholder')).resolves.toMatch(/example duty/);
    await page.getByText('Required: enter a value.').first().waitFor();
    await drum.pressSequentially('450', { delay: 15 });
    await expect(drum.inputValue()).resolves.toBe('450');
    await screenshot(page, 'start-empty-sheet');
  });

  it('the example duty is marked; Send for check lists the marks and refuses until confirmed', async () => {
    const { page } = browser;
    await newSheet(page, baseUrl, `Example start ${Date.now().toString(36)}`, /^The example duty/);
    await page.getByTestId('unconfirmed-note').waitFor();
    const marked = page.locator('[data-unconfirmed]');
    const before = await marked.count();
    expect(before).toBeGreaterThan(20);
    // Changing a value confirms it.
    const drum = page.getByRole('textbox', { name: /^Brake drum diameter/ });
    await drum.click();
    await drum.press('ControlOrMeta+a');
    await drum.pressSequentially('420', { delay: 15 });
    await expect.poll(() => marked.count()).toBe(before - 1);
    await screenshot(page, 'start-example-marked');

    await page.locator('[data-save-status="saved"]').waitFor({ timeout: 15000 });
    await page.getByRole('button', { name: 'Send for check' }).click();
    const refusal = page.getByRole('dialog', { name: 'Not sent: values not yet confirmed' });
    await refusal.waitFor();
    await refusal.getByText('Lining width').waitFor();
    await expect(refusal.getByText('Brake drum diameter').count()).resolves.toBe(0);
    await screenshot(page, 'start-example-refused');
    await refusal.getByRole('button', { name: 'Back to the inputs' }).click();

    await page.getByRole('button', { name: /^I have checked all/ }).click();
    // It asks first: each value compared with this brake's data.
    const ask = page.getByRole('dialog', { name: /^Confirm \d+ values$/ });
    await expect(ask.getByRole('button', { name: /^Confirm all/ }).isDisabled()).resolves.toBe(
      true,
    );
    await ask.getByRole('checkbox', { name: /compared all \d+ with this brake/ }).check();
    await ask.getByRole('button', { name: /^Confirm all/ }).click();
    await expect.poll(() => marked.count()).toBe(0);
    await page.locator('[data-save-status="saved"]').waitFor({ timeout: 15000 });
    await page.getByRole('button', { name: 'Send for check' }).click();
    await page.getByRole('dialog', { name: 'Send for check' }).waitFor();
  });
});
