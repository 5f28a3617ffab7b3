import { readFile } from 'node:fs/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Download } from 'playwright-core';
import { e2eBaseUrl, e2eSkipReason, launchBrowser, type BrowserSession } from './support/browser';
import { screenshot } from './support/screenshot';
import { signInAs } from './support/sign-in';

const skipReason = e2eSkipReason();
if (skipReason) console.warn(`[browser] print and export tests skipped: ${skipReason}`);

const text = async (d: Download) => readFile((await d.path())!, 'utf8');

/** Issue 11 item 10: named PDF downloads, a safety file from the list, CSV exports. */
describe.skipIf(skipReason !== null)('printing and export', () => {
  const baseUrl = e2eBaseUrl()!;
  let browser: BrowserSession;
  beforeAll(async () => {
    browser = await launchBrowser({ width: 1280, height: 900 });
    await signInAs(browser.page, baseUrl, 'viewer');
  });
  afterAll(async () => {
    await browser?.close();
  });

  // Two whole sheets render in one request: about 4 s idle here, far longer while the other lane
  // and the server suites share the two cores. This test is about the file, not its speed (the
  // render time is `npm run bench`'s), so it waits long.
  it(
    'prints two approved sheets from the list as one safety-file PDF',
    { timeout: 180_000 },
    async () => {
      const { page } = browser;
      await page.goto(`${baseUrl}/sheets`);
      await page.getByRole('table', { name: 'Calculation sheets' }).waitFor();
      const boxes = page.getByRole('checkbox', { name: /^Print HF-/ });
      await boxes.nth(0).check();
      await boxes.nth(1).check();
      await screenshot(page, 'print-selected');
      const [download] = await Promise.all([
        page.waitForEvent('download', { timeout: 150_000 }),
        page.getByRole('button', { name: 'Print selected (2)' }).click(),
      ]);
      expect(download.suggestedFilename()).toMatch(
        /^holdfast-safety-file-\d{4}-\d{2}-\d{2}-2-sheets\.pdf$/,
      );
      const head = (await readFile((await download.path())!)).subarray(0, 5).toString();
      expect(head).toBe('%PDF-');
    },
  );

  it('downloads a printout under its document number, revision and kind', async () => {
    const { page } = browser;
    await page.getByRole('link', { name: /^HF-/ }).first().click();
    await page.getByTestId('document-number').waitFor();
    const number = (await page.getByTestId('document-number').textContent())!.trim();
    await page.getByRole('button', { name: 'Print' }).click();
    const [download] = await Promise.all([
      page.waitForEvent('download', { timeout: 60000 }),
      page.getByRole('menuitem', { name: 'Field setting card (PDF)' }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(
      new RegExp(`^${number}-rev-[A-Z]+-field-card\\.pdf$`),
    );
  });

  it('exports the sheet list and the register as CSV', async () => {
    const { page } = browser;
    await page.goto(`${baseUrl}/sheets`);
    await page.getByRole('table', { name: 'Calculation sheets' }).waitFor();
    const [list] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Export CSV' }).click(),
    ]);
    expect(list.suggestedFilename()).toMatch(/^holdfast-sheets-\d{4}-\d{2}-\d{2}\.csv$/);
    const rows = (await text(list))
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\r\n');
    expect(rows[0]).toBe(
      'Document number,Title,Site,Machine,Brake position,Sheet type,Latest revision,Latest state,In force,Approved on,Owner,Changed',
    );
    const shown = await page.getByText(/^\d+ sheets?$/).textContent();
    expect(rows.length - 1).toBe(Number.parseInt(shown!, 10));

    await page.goto(`${baseUrl}/equipment`);
    await page.getByRole('heading', { name: 'Equipment' }).waitFor();
    const [reg] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Export CSV' }).click(),
    ]);
    const regRows = (await text(reg))
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\r\n');
    expect(regRows[0]).toMatch(/^Site code,Site,Machine tag,/);
    expect(regRows.length).toBeGreaterThan(3);
  });

  it('prints a field record from its position page, under its position and date', async () => {
    const { page } = browser;
    await page.goto(`${baseUrl}/equipment`);
    // The demo's MH-B1 holds seeded records; the first position listed may be one another
    // test made, with a sheet in force and no record yet.
    await page
      .locator('tr[data-position="MH-B1"]')
      .first()
      .getByRole('link', { name: 'Field records' })
      .click();
    await page.getByRole('heading', { name: 'Timeline' }).waitFor();
    const [record] = await Promise.all([
      page.waitForEvent('download', { timeout: 60000 }),
      page
        .getByRole('button', { name: /^Print the record of / })
        .first()
        .click(),
    ]);
    expect(record.suggestedFilename()).toMatch(
      /^[\w-]+-field-record-\d{4}-\d{2}-\d{2}(-draft)?\.pdf$/,
    );
    const head = (await readFile((await record.path())!)).subarray(0, 5).toString();
    expect(head).toBe('%PDF-');
  });
});
