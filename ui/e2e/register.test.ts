import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { e2eBaseUrl, e2eSkipReason, launchBrowser, type BrowserSession } from './support/browser';
import { screenshot } from './support/screenshot';
import { signInAs } from './support/sign-in';

const skipReason = e2eSkipReason();
if (skipReason) console.warn(`[browser] register tests skipped: ${skipReason}`);

/** Issue 11 item 9: the register is kept in the app, and a second open sheet is warned about. */
describe.skipIf(skipReason !== null)('the register managed in the app', () => {
  const baseUrl = e2eBaseUrl()!;
  let browser: BrowserSession;
  const code = `T${Date.now().toString(36).slice(-4).toUpperCase()}`;
  const foundry = `Test foundry ${code}`;
  const tag = `B-${code}`;
  beforeAll(async () => {
    browser = await launchBrowser({ width: 1280, height: 900 });
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('an engineer adds a site, a machine and a position, then describes the brake', async () => {
    const { page, context } = browser;
    await context.clearCookies();
    await signInAs(page, baseUrl, 'engineer');
    await page.goto(`${baseUrl}/equipment`);
    await page.getByRole('heading', { name: 'Equipment' }).waitFor();

    await page.getByRole('button', { name: 'Add site' }).click();
    let dialog = page.getByRole('dialog', { name: 'Add a site' });
    await dialog.getByRole('textbox', { name: /Site code/ }).pressSequentially(code);
    await dialog.getByRole('textbox', { name: /Site name/ }).pressSequentially(foundry);
    await dialog.getByRole('button', { name: 'Add site' }).click();
    await dialog.waitFor({ state: 'detached' });
    const site = page
      .locator('section[aria-labelledby^="site-"]')
      .filter({ has: page.getByRole('heading', { name: foundry }) });

    await site.getByRole('button', { name: 'Add machine' }).click();
    dialog = page.getByRole('dialog', { name: `Add a machine at ${code}` });
    await dialog.getByRole('textbox', { name: /^Tag/ }).pressSequentially('CR-9');
    await dialog.getByRole('textbox', { name: /^Name/ }).pressSequentially('Pouring crane');
    await dialog.getByLabel(/Kind of machine/).click();
    await page.getByRole('option', { name: 'crane' }).click();
    await dialog.getByRole('button', { name: 'Add machine' }).click();
    await dialog.waitFor({ state: 'detached' });

    await site.getByRole('button', { name: 'Add position to CR-9' }).click();
    dialog = page.getByRole('dialog', { name: 'Add a brake position to CR-9' });
    // A required field left empty is named, and nothing is lost.
    await dialog.getByRole('textbox', { name: /Position tag/ }).pressSequentially(tag);
    await dialog.getByRole('button', { name: 'Add position' }).click();
    await dialog.getByText('Required.').first().waitFor();
    await dialog
      .getByRole('textbox', { name: /^Description/ })
      .pressSequentially('Main hoist brake');
    await dialog.getByLabel(/^Motion/).click();
    await page.getByRole('option', { name: 'hoist', exact: true }).click();
    await dialog
      .getByRole('textbox', { name: /^Brake/ })
      .pressSequentially('two-shoe drum brake, 315 mm');
    await dialog.getByRole('button', { name: 'Add position' }).click();
    await dialog.waitFor({ state: 'detached' });
    const row = site.locator(`[data-position="${tag}"]`);
    await row.getByText('None approved').waitFor();

    await row.getByRole('button', { name: `Edit ${tag}` }).click();
    dialog = page.getByRole('dialog', { name: `Edit brake position ${tag}` });
    await dialog
      .getByRole('textbox', { name: /^Thruster/ })
      .pressSequentially('thruster 500 N, 50 mm stroke');
    await dialog.getByRole('button', { name: 'Save' }).click();
    await dialog.waitFor({ state: 'detached' });
    await expect(row.getByTestId('position-words').textContent()).resolves.toBe(
      'two-shoe drum brake, 315 mm · thruster 500 N, 50 mm stroke',
    );
    await screenshot(page, 'register-edited');
  });

  it('warns before a second open sheet is started for the position', async () => {
    const { page } = browser;
    const openNewSheet = async () => {
      await page.goto(`${baseUrl}/sheets`);
      await page.getByRole('button', { name: 'New sheet' }).click();
      const dialog = page.getByRole('dialog', { name: 'New calculation sheet' });
      await dialog.getByPlaceholder('Choose a position').click();
      await page.getByRole('option', { name: `${tag} — Main hoist brake` }).click();
      return dialog;
    };
    // The first sheet starts from the position's row: position and sheet type already chosen.
    await page.goto(`${baseUrl}/equipment`);
    await page.getByRole('link', { name: `Start a sheet for ${tag}` }).click();
    let dialog = page.getByRole('dialog', { name: 'New calculation sheet' });
    await expect(dialog.getByPlaceholder('Choose a position').inputValue()).resolves.toBe(
      `${tag} — Main hoist brake`,
    );
    await expect(dialog.getByLabel(/^Sheet type/).inputValue()).resolves.toBe(
      'Shoe brake on a hoist',
    );
    await expect(dialog.getByTestId('open-sheet-warning').count()).resolves.toBe(0);
    await dialog
      .getByRole('textbox', { name: /^Title/ })
      .pressSequentially('Pouring crane hoist brake');
    await dialog.getByRole('button', { name: 'Create sheet' }).click();
    await page.getByRole('heading', { name: 'Pouring crane hoist brake' }).waitFor();
    // With a sheet open on it, the row offers no second start.
    await page.goto(`${baseUrl}/equipment`);
    await page
      .locator(`[data-position="${tag}"]`)
      .getByText(/^Open: /)
      .waitFor();
    await expect(
      page.getByRole('link', { name: `Start a sheet for ${tag}` }).count(),
    ).resolves.toBe(0);

    dialog = await openNewSheet();
    await dialog.getByTestId('open-sheet-warning').waitFor();
    await expect(dialog.getByTestId('open-sheet-warning').textContent()).resolves.toMatch(
      /already has an open .* sheet/,
    );
    await screenshot(page, 'register-open-sheet-warning');
  });
});
