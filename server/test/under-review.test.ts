import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { CriterionValue } from '@holdfast/calc';
import { ensurePoppler, inspectPdf } from '@holdfast/print/testing';
import { stricterValues } from './criteria-fixture.js';
import {
  approve,
  createSheet,
  createSheetsContext,
  getRevision,
  makeRegister,
  submit,
  waitFor,
  type SheetsContext,
} from './sheets-fixture.js';

describe('approvals follow criteria changes ("under review")', () => {
  let ctx: SheetsContext;
  beforeAll(async () => {
    ctx = await createSheetsContext();
  });
  beforeEach(() => ctx.resetAll());
  afterAll(() => ctx?.closeAll());

  /** Sheet by the engineer, rev. A approved by the checker, then a stricter version 2 published. */
  /** Rev. A written and submitted by `author`, approved, then flagged by a stricter version. */
  async function flaggedScenario(author: 'engineer' | 'checker' = 'engineer') {
    const reg = await makeRegister(ctx);
    const sheet = await createSheet(ctx, reg, { as: author });
    const aId = sheet.revisions[0].id;
    await submit(ctx, aId, author);
    await approve(ctx, aId, author === 'checker' ? 'checker2' : 'checker');
    const a = await getRevision(ctx, aId);
    const current = await ctx.request('GET', `/api/criteria-sets/${a.criteriaSetId}`, {
      as: 'admin',
    });
    const pub = await ctx.request('POST', `/api/criteria-sets/${a.criteriaSetId}/versions`, {
      as: 'admin',
      body: {
        values: stricterValues(current.body.values as CriterionValue[]),
        note: 'Lower p·v limit (test).',
      },
    });
    expect(pub.status, pub.text).toBe(201);
    return { sheet, a, setName: current.body.name as string };
  }

  it('flags the approved revision beside its frozen record, tells owner and checker, and /verify says so', async () => {
    const { sheet, a, setName } = await flaggedScenario();
    const review = await ctx.request('GET', `/api/revisions/${a.id}/criteria-review`, {
      as: 'viewer',
    });
    expect(review.status, review.text).toBe(200);
    expect(review.body.open).toMatchObject({
      revisionId: a.id,
      criteriaSetId: a.criteriaSetId,
      criteriaSetName: setName,
      criteriaSetVersion: 2,
      clearedAt: null,
    });
    expect(review.body.open.failing.map((f: { id: string }) => f.id).join(' ')).toMatch(/pv/i);
    expect(review.body.canDispose).toBe(false);

    // The record itself did not change.
    const after = await getRevision(ctx, a.id);
    expect(after).toMatchObject({ state: 'approved', hash: a.hash, rowVersion: a.rowVersion });

    for (const who of ['engineer', 'checker'] as const) {
      const q = await ctx.request('GET', '/api/work-queue/under-review', { as: who });
      expect(q.body.items, who).toEqual([
        expect.objectContaining({
          revisionId: a.id,
          criteriaSetVersion: 2,
          criteriaSetName: setName,
        }),
      ]);
    }
    const other = await ctx.request('GET', '/api/work-queue/under-review', { as: 'checker2' });
    expect(other.body.items).toEqual([]);

    const mail = await waitFor(() => ctx.smtp.mails.find((m) => /under review/.test(m.raw)));
    expect(mail.to.sort()).toEqual(['checker@holdfast.test', 'engineer@holdfast.test']);
    expect(mail.raw).toContain(`${sheet.documentNumber} rev. A`);

    const verify = await ctx.request('GET', `/api/verify/${a.verificationCode}`);
    expect(verify.status).toBe(200);
    expect(verify.body).toMatchObject({
      state: 'approved',
      current: true,
      underReview: { criteriaSetName: setName, criteriaSetVersion: 2 },
    });
    expect(Object.keys(verify.body.underReview).sort()).toEqual([
      'criteriaSetName',
      'criteriaSetVersion',
      'since',
    ]);

    const drift = await ctx.request('POST', `/api/revisions/${a.id}/drift`, { as: 'viewer' });
    expect(drift.body.newestCriteria).toMatchObject({ versionThen: 1, versionNow: 2, error: null });
    expect(drift.body.newestCriteria.failing.length).toBeGreaterThan(0);

    const audit = await ctx.request('GET', `/api/sheets/${sheet.id}/audit`, { as: 'engineer' });
    expect(JSON.stringify(audit.body)).toContain('revision.under-review');
  });

  it('a checker’s written disposition clears the flag and is kept; others are refused', async () => {
    const { sheet, a } = await flaggedScenario();
    const url = `/api/revisions/${a.id}/criteria-review/disposition`;
    const text = 'Reviewed: stands because the lining maker confirms 2.1 MPa·m/s for this duty.';
    expect(
      (await ctx.request('POST', url, { as: 'engineer', body: { disposition: text } })).status,
    ).toBe(403);
    const short = await ctx.request('POST', url, { as: 'checker', body: { disposition: 'ok' } });
    expect(short.status).toBe(400);
    expect(short.body.error.fields[0].path).toBe('disposition');
    const ok = await ctx.request('POST', url, { as: 'checker2', body: { disposition: text } });
    expect(ok.status, ok.text).toBe(200);
    expect(ok.body.open).toBeNull();
    expect(ok.body.cleared).toEqual([
      expect.objectContaining({
        clearedHow: 'disposition',
        disposition: text,
        clearedBy: expect.objectContaining({ id: await ctx.userId('checker2') }),
      }),
    ]);
    const again = await ctx.request('POST', url, { as: 'checker', body: { disposition: text } });
    expect(again.status).toBe(409);
    const verify = await ctx.request('GET', `/api/verify/${a.verificationCode}`);
    expect(verify.body.underReview).toBeNull();
    const q = await ctx.request('GET', '/api/work-queue/under-review', { as: 'engineer' });
    expect(q.body.items).toEqual([]);
    const audit = await ctx.request('GET', `/api/sheets/${sheet.id}/audit`, { as: 'engineer' });
    expect(JSON.stringify(audit.body)).toContain(text);
  });

  async function pdfText(revisionId: string, name: string): Promise<string> {
    const res = await fetch(`${ctx.baseUrl}/api/revisions/${revisionId}/pdf`, {
      headers: { authorization: `Bearer ${await ctx.token('viewer')}` },
    });
    expect(res.status).toBe(200);
    // pdftotext breaks long lines: compare with single spaces.
    return inspectPdf(Buffer.from(await res.arrayBuffer()), name).text.replace(/\s+/g, ' ');
  }

  it('the checker who wrote and submitted the revision may not record that it stands', async () => {
    const { a } = await flaggedScenario('checker');
    const url = `/api/revisions/${a.id}/criteria-review/disposition`;
    const disposition = 'Reviewed: stands because the maker confirms the limit for this duty.';
    const review = await ctx.request('GET', `/api/revisions/${a.id}/criteria-review`, {
      as: 'checker',
    });
    expect(review.body.canDispose).toBe(false);
    const own = await ctx.request('POST', url, { as: 'checker', body: { disposition } });
    expect(own.status).toBe(403);
    expect(own.body.error.message).toMatch(/Four eyes: you authored, edited and submitted/);
    const other = await ctx.request('POST', url, { as: 'checker2', body: { disposition } });
    expect(other.status, other.text).toBe(200);
  });

  it('prints the open flag, then the disposition, on the next print of the sheet', async () => {
    ensurePoppler();
    const { a, setName } = await flaggedScenario();
    const flagged = await pdfText(a.id, 'under-review-open');
    expect(flagged).toContain(`Under review since`);
    expect(flagged).toContain(`criteria ${setName} version 2`);
    const text = 'Reviewed with the lining maker: stands because the duty is occasional.';
    const ok = await ctx.request('POST', `/api/revisions/${a.id}/criteria-review/disposition`, {
      as: 'checker2',
      body: { disposition: text },
    });
    expect(ok.status, ok.text).toBe(200);
    const disposed = await pdfText(a.id, 'under-review-disposed');
    expect(disposed).not.toContain('Under review since');
    expect(disposed).toContain(`Stands because: ${text}`);
    // Two PDF renders on a shared, loaded machine.
  }, 120_000);

  it('approving a new revision of the sheet clears the flag', async () => {
    const { sheet, a } = await flaggedScenario();
    const b = await ctx.request('POST', `/api/sheets/${sheet.id}/revisions`, {
      as: 'engineer',
      body: { changeNote: 'Answer to criteria version 2.' },
    });
    expect(b.status, b.text).toBe(201);
    await submit(ctx, b.body.id);
    await approve(ctx, b.body.id, 'checker2');
    const review = await ctx.request('GET', `/api/revisions/${a.id}/criteria-review`, {
      as: 'engineer',
    });
    expect(review.body.open).toBeNull();
    expect(review.body.cleared).toEqual([expect.objectContaining({ clearedHow: 'superseded' })]);
    const q = await ctx.request('GET', '/api/work-queue/under-review', { as: 'checker' });
    expect(q.body.items).toEqual([]);
  });

  it('keeps cleared flags as records in the database', async () => {
    const { a } = await flaggedScenario();
    await ctx.request('POST', `/api/revisions/${a.id}/criteria-review/disposition`, {
      as: 'checker2',
      body: { disposition: 'Reviewed: stands because of the plant standard.' },
    });
    const { sql } = await import('kysely');
    await expect(
      sql`update criteria_reviews set disposition = 'rewritten' where revision_id = ${a.id}`.execute(
        ctx.db,
      ),
    ).rejects.toThrow(/cleared and cannot change/);
    await expect(
      sql`delete from criteria_reviews where revision_id = ${a.id}`.execute(ctx.db),
    ).rejects.toThrow(/cannot be deleted/);
  });
});
