import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import {
  approve,
  createSheet,
  createSheetsContext,
  getRevision,
  makeRegister,
  submit,
  type SheetsContext,
  waitFor,
} from './sheets-fixture.js';

describe('one read rule everywhere', () => {
  let ctx: SheetsContext;
  let sheetId: string;
  let revA: string;
  beforeAll(async () => {
    ctx = await createSheetsContext({ MAIL_RETRY_LIMIT: '0' });
  });
  beforeEach(async () => {
    await ctx.resetAll();
    const sheet = await createSheet(ctx, await makeRegister(ctx));
    sheetId = sheet.id;
    revA = sheet.revisions[0]!.id;
  });
  afterAll(() => ctx?.closeAll());

  /** A approved, then a draft B with a change note only engineers may read. */
  async function approvedThenDraft(): Promise<string> {
    await submit(ctx, revA);
    await approve(ctx, revA);
    const b = await ctx.request('POST', `/api/sheets/${sheetId}/revisions`, {
      as: 'engineer',
      body: { changeNote: 'Heavier ladle, draft reasoning' },
    });
    expect(b.status, b.text).toBe(201);
    return b.body.id;
  }

  it('gives an admin no draft payloads in the audit trail, as GET revision gives none', async () => {
    const rev = await getRevision(ctx, revA);
    const save = await ctx.request('PUT', `/api/revisions/${revA}`, {
      as: 'engineer',
      body: {
        inputs: rev.inputs,
        unitSystem: rev.unitSystem,
        changeNote: 'draft thoughts',
        rowVersion: rev.rowVersion,
      },
    });
    expect(save.status, save.text).toBe(200);
    expect((await ctx.request('GET', `/api/revisions/${revA}`, { as: 'admin' })).status).toBe(403);

    const admin = await ctx.request('GET', `/api/sheets/${sheetId}/audit`, { as: 'admin' });
    expect(admin.status).toBe(200);
    const saved = admin.body.items.find((e: { action: string }) => e.action === 'revision.saved');
    expect(saved.after).toEqual({ state: 'draft' });
    expect(admin.text).not.toContain('draft thoughts');

    const engineer = await ctx.request('GET', `/api/sheets/${sheetId}/audit`, { as: 'engineer' });
    expect(engineer.text).toContain('draft thoughts');
  });

  it('shows viewers (and admins) no change note of an unreleased revision', async () => {
    const revB = await approvedThenDraft();
    for (const who of ['viewer', 'admin'] as const) {
      const sheet = await ctx.request('GET', `/api/sheets/${sheetId}`, { as: who });
      const b = sheet.body.revisions.find((r: { id: string }) => r.id === revB);
      const a = sheet.body.revisions.find((r: { id: string }) => r.id === revA);
      expect(b.changeNote, who).toBe('');
      expect(a.changeNote, who).toBe('First issue.');
      expect(sheet.text).not.toContain('draft reasoning');
    }
    const engineer = await ctx.request('GET', `/api/sheets/${sheetId}`, { as: 'engineer' });
    expect(engineer.text).toContain('Heavier ladle, draft reasoning');
  });

  it('lets only a checker or the sheet owner comment on an approved revision', async () => {
    const revB = await approvedThenDraft();
    const comment = (id: string, as: 'engineer' | 'engineer2' | 'checker' | 'viewer') =>
      ctx.request('POST', `/api/revisions/${id}/comments`, { as, body: { body: 'Field note.' } });
    expect((await comment(revA, 'engineer2')).status).toBe(403);
    expect((await comment(revA, 'viewer')).status).toBe(403);
    expect((await comment(revA, 'engineer')).status).toBe(201);
    expect((await comment(revA, 'checker')).status).toBe(201);
    expect((await comment(revB, 'engineer2')).status).toBe(201);
  });

  it('lists mail that failed for good to admins and sends it again on request', async () => {
    await ctx.smtp.stop();
    let smtpDown = true;
    try {
      const id = await ctx.userId('viewer');
      const reset = await ctx.request('POST', `/api/users/${id}/password-reset`, { as: 'admin' });
      expect(reset.status).toBe(202);
      const failed = await waitFor(async () => {
        const res = await ctx.request('GET', '/api/admin/mail/failed', { as: 'admin' });
        return res.body.items.length > 0 ? res.body.items : undefined;
      });
      expect(failed[0]).toMatchObject({
        to: ['viewer@holdfast.test'],
        subject: '[Holdfast] Set a new password',
        attempts: 1,
      });
      expect(failed[0].lastError).toBeTruthy();
      expect((await ctx.request('GET', '/api/admin/mail/failed', { as: 'checker' })).status).toBe(
        403,
      );
      await ctx.smtp.start();
      smtpDown = false;
      const resend = await ctx.request('POST', `/api/admin/mail/${failed[0].id}/resend`, {
        as: 'admin',
      });
      expect(resend.status).toBe(202);
      await waitFor(async () =>
        ctx.smtp.mails.some((m) => m.to.includes('viewer@holdfast.test')) ? true : undefined,
      );
      const after = await ctx.request('GET', '/api/admin/mail/failed', { as: 'admin' });
      expect(after.body.items).toEqual([]);
      const again = await ctx.request('POST', `/api/admin/mail/${failed[0].id}/resend`, {
        as: 'admin',
      });
      expect(again.status).toBe(404);
    } finally {
      if (smtpDown) await ctx.smtp.start();
    }
  });
});
