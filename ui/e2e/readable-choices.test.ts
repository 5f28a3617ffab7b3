import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createHoistSheet } from './support/api';
import { e2eBaseUrl, e2eSkipReason, launchBrowser, type BrowserSession } from './support/browser';
import { screenshot } from './support/screenshot';
import { signInAs } from './support/sign-in';

const skipReason = e2eSkipReason();
if (skipReason) console.warn(`[browser] readable choices tests skipped: ${skipReason}`);

/**
 * Select boxes and read-only combobox inputs whose chosen text is wider than the box shows, as
 * "label: chosen text". The text is measured in the control's own font.
 */
function cutChoices(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const ctx = document.createElement('canvas').getContext('2d')!;
    const cut: string[] = [];
    const controls = document.querySelectorAll<HTMLInputElement | HTMLSelectElement>(
      'select, input[role="combobox"], input[aria-haspopup="listbox"], input[readonly]',
    );
    for (const el of controls) {
      if (el.getBoundingClientRect().width === 0) continue;
      const text =
        el instanceof HTMLSelectElement ? (el.selectedOptions[0]?.textContent ?? '') : el.value;
      if (!text) continue;
      const cs = getComputedStyle(el);
      ctx.font = `${cs.fontWeight} ${cs.fontSize} ${cs.fontFamily}`;
      const room = el.clientWidth - parseFloat(cs.paddingLeft) - parseFloat(cs.paddingRight);
      if (ctx.measureText(text).width > room + 0.5)
        cut.push(`${el.getAttribute('aria-label') ?? el.id}: ${text}`);
    }
    return cut;
  });
}

/** Chooses, in every select box of the editor, its longest option. */
async function chooseLongestEverywhere(page: Page): Promise<number> {
  const selects = page.locator('[data-testid="workbench-inputs"] select');
  const n = await selects.count();
  for (let i = 0; i < n; i++) {
    const select = selects.nth(i);
    if (await select.isDisabled()) continue;
    const longest = await select.evaluate(
      (el: HTMLSelectElement) =>
        [...el.options].reduce((a, o) => (o.text.length > a.text.length ? o : a), el.options[0]!)
          .value,
    );
    await select.selectOption(longest);
  }
  return n;
}

describe.skipIf(skipReason !== null)('choices read whole at 1024 px and above', () => {
  const baseUrl = e2eBaseUrl()!;
  let browser: BrowserSession;
  let sheet: Awaited<ReturnType<typeof createHoistSheet>>;

  beforeAll(async () => {
    browser = await launchBrowser({ width: 1024, height: 900 });
    sheet = await createHoistSheet(baseUrl, 'engineer', `Choices ${Date.now().toString(36)}`);
    await signInAs(browser.page, baseUrl, 'engineer');
  });
  afterAll(async () => {
    await browser?.close();
  });

  for (const width of [1024, 1440]) {
    it(`in the editor at ${width} px, with the navigation open and closed`, async () => {
      const { page } = browser;
      await page.setViewportSize({ width, height: 900 });
      await page.goto(baseUrl + sheet.path);
      await page.locator('[data-check]').first().waitFor();
      // The arrangement of holding brakes: its choices are sentences, shown whole as radio buttons.
      const arrangement = page.getByRole('radio', { name: /^Two holding brakes/ });
      await arrangement.check();
      await expect.poll(() => arrangement.isChecked()).toBe(true);
      expect(await chooseLongestEverywhere(page)).toBeGreaterThan(0);
      expect(await cutChoices(page)).toEqual([]);
      const toggle = page.getByTestId('nav-toggle');
      const open = (await toggle.getAttribute('aria-expanded')) === 'true';
      await toggle.click();
      await expect.poll(() => toggle.getAttribute('aria-expanded')).toBe(String(!open));
      await page.waitForTimeout(300); // the frame's slide
      expect(await cutChoices(page)).toEqual([]);
      await screenshot(page, `choices-editor-${width}-nav-${open ? 'closed' : 'open'}`);
      await toggle.click();
      await expect.poll(() => toggle.getAttribute('aria-expanded')).toBe(String(open));
    });

    it(`in the sheet list filters at ${width} px`, async () => {
      const { page } = browser;
      await page.setViewportSize({ width, height: 900 });
      await page.goto(`${baseUrl}/sheets`);
      await page.getByRole('table').first().waitFor();
      for (const label of ['State', 'Site', 'Sheet type']) {
        const box = page.getByRole('combobox', { name: label, exact: true });
        await box.click();
        const options = page.getByRole('option');
        await options.first().waitFor();
        const texts = await options.allTextContents();
        const longest = texts.reduce((a, t) => (t.length > a.length ? t : a), '');
        await page.getByRole('option', { name: longest, exact: true }).click();
        await expect.poll(() => box.inputValue()).toBe(longest);
      }
      // Equipment is searchable: typed key by key, then the first match taken.
      const equipment = page.getByRole('combobox', { name: 'Equipment', exact: true });
      await equipment.click();
      await equipment.pressSequentially('LC', { delay: 30 });
      await page.getByRole('option').first().click();
      expect(await equipment.inputValue()).not.toBe('');
      expect(await cutChoices(page)).toEqual([]);
      await screenshot(page, `choices-sheet-list-${width}`);
    });

    it(`in the new-sheet dialog at ${width} px`, async () => {
      const { page } = browser;
      await page.setViewportSize({ width, height: 900 });
      await page.goto(`${baseUrl}/sheets`);
      await page.getByRole('button', { name: 'New sheet' }).click();
      const dialog = page.getByRole('dialog', { name: 'New calculation sheet' });
      for (const label of [/^Brake position/, /^Sheet type/]) {
        await dialog.getByRole('combobox', { name: label }).click();
        const options = page.getByRole('option');
        await options.first().waitFor();
        const texts = await options.allTextContents();
        const longest = texts.reduce((a, t) => (t.length > a.length ? t : a), '');
        await page.getByRole('option', { name: longest, exact: true }).click();
      }
      expect(await cutChoices(page)).toEqual([]);
      await screenshot(page, `choices-new-sheet-${width}`);
      await page.keyboard.press('Escape');
    });
  }
});

describe.skipIf(skipReason !== null)('role names read whole in the users table', () => {
  const baseUrl = e2eBaseUrl()!;
  let browser: BrowserSession;
  beforeAll(async () => {
    browser = await launchBrowser({ width: 1024, height: 900 });
    await signInAs(browser.page, baseUrl, 'admin');
  });
  afterAll(async () => {
    await browser?.close();
  });

  for (const width of [1024, 1440]) {
    it(`at ${width} px`, async () => {
      const { page } = browser;
      await page.setViewportSize({ width, height: 900 });
      await page.goto(`${baseUrl}/admin/users`);
      const boxes = page.getByRole('combobox', { name: /^Role of / });
      await boxes.first().waitFor();
      // The longest name, "Viewer (plant engineer)", is among the demo users'.
      await expect.poll(() => boxes.count()).toBeGreaterThan(4);
      expect(await cutChoices(page)).toEqual([]);
      await screenshot(page, `choices-users-${width}`);
    });
  }
});
