import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import {
  approve,
  createSheet,
  createSheetsContext,
  getRevision,
  makeRegister,
  submit,
  waitFor,
  type Register,
  type SheetsContext,
} from './sheets-fixture.js';

describe('notifications through the outbox', () => {
  let ctx: SheetsContext;
  let reg: Register;
  beforeAll(async () => {
    ctx = await createSheetsContext();
  });
  beforeEach(async () => {
    await ctx.resetAll();
    reg = await makeRegister(ctx);
  });
  afterAll(() => ctx?.closeAll());

  it('mails the checkers on submit and the author on approval, with a link to the revision', async () => {
    const sheet = await createSheet(ctx, reg);
    const id = sheet.revisions[0].id;
    await submit(ctx, id);
    // Found by this revision's link: a mail another file's app was still sending when the
    // database was reset can reach this fake SMTP server too.
    const link = `http://holdfast.test/sheets/${sheet.id}/revisions/${id}`;
    const toCheckers = await waitFor(() =>
      ctx.smtp.mails.find((m) => /waiting for your check/.test(m.raw) && m.raw.includes(link)),
    );
    expect(toCheckers.to.sort()).toEqual(['checker2@holdfast.test', 'checker@holdfast.test']);
    await approve(ctx, id);
    const toAuthor = await waitFor(() =>
      ctx.smtp.mails.find(
        (m) =>
          /^Subject: .* approved$/m.test(m.raw) &&
          m.to.includes('engineer@holdfast.test') &&
          m.raw.includes(link),
      ),
    );
    expect(toAuthor.raw).toContain('Mara Lind approved');
    const row = await ctx.db.selectFrom('outbox').selectAll().orderBy('createdAt').execute();
    expect(row).toHaveLength(2);
  });

  it('mails the author when returned, quoting the comment', async () => {
    const sheet = await createSheet(ctx, reg);
    const id = sheet.revisions[0].id;
    await submit(ctx, id);
    const rev = await getRevision(ctx, id, 'checker2');
    await ctx.request('POST', `/api/revisions/${id}/return`, {
      as: 'checker2',
      body: { rowVersion: rev.rowVersion, comment: 'Check the lining pressure at worn lining.' },
    });
    const mail = await waitFor(() =>
      ctx.smtp.mails.find((m) => /returned with comments/.test(m.raw)),
    );
    expect(mail.to).toEqual(['engineer@holdfast.test']);
    expect(mail.raw).toContain('Check the lining pressure at worn lining.');
  });

  it('a mail outage blocks nothing and loses nothing: the message arrives after SMTP returns', async () => {
    await ctx.smtp.stop();
    const sheet = await createSheet(ctx, reg);
    const id = sheet.revisions[0].id;
    const started = Date.now();
    const submitted = await submit(ctx, id);
    expect(submitted.state).toBe('in_check');
    expect(Date.now() - started).toBeLessThan(5000);
    // The worker tries, fails and records the attempt.
    let row: { attempts: number; sentAt: Date | null; lastError: string | null } | undefined;
    const deadline = Date.now() + 15000;
    while (Date.now() < deadline) {
      row = await ctx.db
        .selectFrom('outbox')
        .select(['attempts', 'sentAt', 'lastError'])
        .executeTakeFirst();
      if (row && row.attempts >= 1) break;
      await new Promise((r) => setTimeout(r, 200));
    }
    expect(row?.attempts).toBeGreaterThanOrEqual(1);
    expect(row?.sentAt).toBeNull();
    expect(row?.lastError).toBeTruthy();
    expect(ctx.smtp.mails).toHaveLength(0);

    await ctx.smtp.start();
    const mail = await waitFor(
      () => ctx.smtp.mails.find((m) => /waiting for your check/.test(m.raw)),
      30000,
    );
    expect(mail.raw).toContain(id);
    const sent = await ctx.db.selectFrom('outbox').select(['sentAt']).executeTakeFirstOrThrow();
    expect(sent.sentAt).not.toBeNull();
  });
});
