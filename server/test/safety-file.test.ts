import { PDFDocument } from 'pdf-lib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  approve,
  createSheet,
  createSheetsContext,
  makeRegister,
  submit,
  type SheetsContext,
} from './sheets-fixture.js';

describe('printing and export', () => {
  let ctx: SheetsContext;
  beforeAll(async () => {
    ctx = await createSheetsContext();
    await ctx.resetAll();
  }, 120_000);
  afterAll(() => ctx?.closeAll());

  const post = async (body: unknown, as?: 'viewer' | 'engineer') => {
    const headers: Record<string, string> = { 'Content-Type': 'application/json' };
    if (as) headers.Authorization = `Bearer ${await ctx.token(as)}`;
    const res = await fetch(`${ctx.baseUrl}/api/print/safety-file`, {
      method: 'POST',
      headers,
      body: JSON.stringify(body),
    });
    return { res, bytes: Buffer.from(await res.arrayBuffer()) };
  };
  const pagesOf = async (id: string) => {
    const res = await fetch(`${ctx.baseUrl}/api/revisions/${id}/pdf`, {
      headers: { Authorization: `Bearer ${await ctx.token('viewer')}` },
    });
    expect(res.status).toBe(200);
    return (await PDFDocument.load(Buffer.from(await res.arrayBuffer()))).getPageCount();
  };

  it('joins approved sheets into one safety-file PDF and refuses anything not approved', async () => {
    const reg = await makeRegister(ctx);
    const one = await createSheet(ctx, reg, { title: 'Hoist brake one' });
    const two = await createSheet(ctx, reg, { title: 'Hoist brake two' });
    for (const s of [one, two]) {
      await submit(ctx, s.revisions[0].id);
      await approve(ctx, s.revisions[0].id);
    }
    const ids = [one.revisions[0].id, two.revisions[0].id];
    const { res, bytes } = await post({ revisionIds: ids }, 'viewer');
    expect(res.status, bytes.toString('utf8', 0, 200)).toBe(200);
    expect(res.headers.get('content-type')).toContain('application/pdf');
    expect(res.headers.get('content-disposition')).toMatch(
      /^attachment; filename="holdfast-safety-file-\d{4}-\d{2}-\d{2}-2-sheets\.pdf"/,
    );
    const merged = await PDFDocument.load(bytes);
    expect(merged.getPageCount()).toBe((await pagesOf(ids[0]!)) + (await pagesOf(ids[1]!)));

    const draft = await createSheet(ctx, reg, { title: 'Still a draft' });
    const refused = await post({ revisionIds: [ids[0], draft.revisions[0].id] }, 'engineer');
    expect(refused.res.status).toBe(400);
    const body = JSON.parse(refused.bytes.toString('utf8'));
    expect(body.error.fields).toEqual([
      { path: 'revisionIds.1', message: `${draft.documentNumber} rev. A is draft` },
    ]);
    expect((await post({ revisionIds: [] }, 'viewer')).res.status).toBe(400);
    expect((await post({ revisionIds: ids })).res.status).toBe(401);
  }, 300_000);
});
