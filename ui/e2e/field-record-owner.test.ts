import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { apiClientAs } from './support/api';
import { e2eBaseUrl, e2eSkipReason, launchBrowser, type BrowserSession } from './support/browser';
import { screenshot } from './support/screenshot';
import { signInAs, signOut } from './support/sign-in';
import { demoPositionInForce, type FieldFormAnswer } from './support/field-form';

const skipReason = e2eSkipReason();
if (skipReason) console.warn(`[browser] field-record owner tests skipped: ${skipReason}`);

interface ListAnswer {
  items: { id: string }[];
}
interface RecordAnswer {
  id: string;
  findings: string;
  createdBy: { displayName: string; initials: string };
}

/**
 * Issue 13, record integrity on a shared device: a record a fitter left waiting on the device is
 * sent only by their own session. Another person signing in is told it is there and whose it is;
 * nothing of it reaches the server until its owner signs in, and then exactly once, under their
 * name.
 */
describe.skipIf(skipReason !== null)('outbox entries belong to who saved them', () => {
  const baseUrl = e2eBaseUrl()!;
  let browser: BrowserSession;
  let positionId = '';
  let revisionId = '';
  let form: FieldFormAnswer;

  beforeAll(async () => {
    browser = await launchBrowser({ width: 1024, height: 844 });
    ({ positionId, revisionId, form } = await demoPositionInForce(baseUrl));
  });
  afterEach(async () => {
    await browser?.context.setOffline(false);
    await browser?.page.unrouteAll();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("another user's session sends nothing of it; its owner's sends it once, as theirs", async () => {
    const { page, context } = browser;
    const posts: string[] = [];
    page.on('request', (req) => {
      if (req.method() === 'POST' && new URL(req.url()).pathname === '/api/field-records') {
        posts.push(req.url());
      }
    });
    const call = await apiClientAs(baseUrl, 'technician');
    const list = async () =>
      (await call<ListAnswer>('GET', `/field-records?positionId=${positionId}`)).items;
    const before = await list();

    // A: the technician records without a connection.
    await signInAs(page, baseUrl, 'technician');
    await page.goto(`${baseUrl}/field-records/new/${revisionId}`);
    await page.getByRole('heading', { name: 'Settings measured' }).waitFor();
    await context.setOffline(true);
    await page.getByRole('textbox', { name: /^Hour meter/ }).pressSequentially('907');
    for (const c of form.checks) {
      await page.getByRole('radiogroup', { name: c.label }).getByText('N/A').click();
    }
    await page.getByRole('textbox', { name: 'Cycles run' }).pressSequentially('5');
    await page
      .getByRole('textbox', { name: 'Findings' })
      .pressSequentially('Saved offline by the technician');
    await page.getByRole('button', { name: 'Save record' }).click();
    await expect
      .poll(() => page.getByTestId('outbox-state').textContent())
      .toBe('Saved on this device');

    // The connection comes back only for signing out: the record's own request still fails (a
    // dead spot), so A leaves with the record waiting on the device.
    await page.route('**/api/field-records', (route) =>
      route.request().method() === 'POST' ? route.abort('internetdisconnected') : route.fallback(),
    );
    await context.setOffline(false);
    await expect.poll(() => posts.length).toBeGreaterThan(0);
    await signOut(page);
    await page.unrouteAll();
    const postsWhileA = posts.length;
    expect(await list()).toHaveLength(before.length);

    // B: an engineer signs in on the same device, online.
    await signInAs(page, baseUrl, 'engineer');
    const notice = page.getByTestId('others-outbox-notice');
    await notice.waitFor();
    expect(await notice.textContent()).toContain(
      'Noor Halden (NH): 1 field record, sent when Noor Halden signs in on this device.',
    );
    expect(await notice.textContent()).toContain('They are not sent under your name');
    await screenshot(page, 'field-record-outbox-other-user');
    // Give a wrongly sending session every chance, then look at the wire and the server.
    await page.waitForTimeout(1500);
    expect(posts.length).toBe(postsWhileA);
    expect(await list()).toHaveLength(before.length);
    await signOut(page);

    // A again: the record goes once, under A's name.
    await signInAs(page, baseUrl, 'technician');
    await expect.poll(list, { timeout: 15000 }).toHaveLength(before.length + 1);
    const added = (await list()).find((r) => !before.some((b) => b.id === r.id))!;
    const stored = await call<RecordAnswer>('GET', `/field-records/${added.id}`);
    expect(stored.findings).toBe('Saved offline by the technician');
    expect(stored.createdBy).toMatchObject({ displayName: 'Noor Halden', initials: 'NH' });
    await page.waitForTimeout(1000);
    expect(await list()).toHaveLength(before.length + 1);
    expect(await page.getByTestId('others-outbox-notice').count()).toBe(0);
  });
});
