import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  createSheet,
  createSheetsContext,
  approve,
  getRevision,
  makeRegister,
  submit,
  type SheetsContext,
} from '../../test/sheets-fixture.js';

// Prints go through the worker pool: a per-user limit, and a cache keyed by revision, row version
// and printed content. One render thread and a limit of one make the 429 certain.
describe('print pool, limit and cache', () => {
  let ctx: SheetsContext;
  beforeAll(async () => {
    ctx = await createSheetsContext({ PRINT_WORKERS: '1', PRINT_USER_LIMIT: '1' });
    await ctx.resetAll();
  }, 120_000);
  afterAll(() => ctx?.closeAll());

  it('answers 429 with Retry-After past the per-user limit, and serves the others', async () => {
    const reg = await makeRegister(ctx);
    const drafts = await Promise.all(
      [1, 2, 3].map(
        async (n) => (await createSheet(ctx, reg, { title: `Hoist ${n}` })).revisions[0].id,
      ),
    );
    const answers = await Promise.all(
      drafts.map((id) => ctx.request('GET', `/api/revisions/${id}/pdf`, { as: 'engineer' })),
    );
    const refused = answers.filter((r) => r.status === 429);
    const served = answers.filter((r) => r.status === 200);
    expect(refused.length, answers.map((r) => r.status).join(',')).toBeGreaterThanOrEqual(1);
    expect(served.length).toBeGreaterThanOrEqual(1);
    expect(refused.length + served.length).toBe(3);
    for (const r of refused) {
      expect(Number(r.headers.get('retry-after'))).toBeGreaterThanOrEqual(1);
      expect((r.body as { error: { code: string } }).error.code).toBe('too_many_requests');
    }
    for (const r of served) expect(r.text.startsWith('%PDF-')).toBe(true);
    // The slots are given back once the renders are done.
    const again = await ctx.request('GET', `/api/revisions/${drafts[0]}/pdf`, { as: 'engineer' });
    expect(again.status).toBe(200);
  }, 300_000);

  it('serves a draft from the cache byte for byte until the draft changes', async () => {
    const reg = await makeRegister(ctx, 'CCH');
    const sheet = await createSheet(ctx, reg, { title: 'Cached hoist' });
    const id = sheet.revisions[0].id;
    const pdf = async () => {
      const res = await fetch(`${ctx.baseUrl}/api/revisions/${id}/pdf`, {
        headers: { authorization: `Bearer ${await ctx.token('engineer')}` },
      });
      expect(res.status).toBe(200);
      return Buffer.from(await res.arrayBuffer());
    };
    const first = await pdf();
    // A fresh render stamps its creation time (to the second), so after a pause equal bytes
    // can only be the cached copy.
    await new Promise((r) => setTimeout(r, 1100));
    expect((await pdf()).equals(first)).toBe(true);

    const rev = await getRevision(ctx, id);
    const saved = await ctx.request('PUT', `/api/revisions/${id}`, {
      as: 'engineer',
      body: {
        inputs: rev.inputs,
        unitSystem: 'SI',
        changeNote: 'new note',
        rowVersion: rev.rowVersion,
      },
    });
    expect(saved.status, saved.text).toBe(200);
    const afterSave = await pdf();
    expect(afterSave.equals(first)).toBe(false);
    expect((await pdf()).equals(afterSave)).toBe(true);

    // Approved: found by revision and row version before the sheet is loaded again.
    await submit(ctx, id);
    await approve(ctx, id);
    const approved = await pdf();
    expect(approved.equals(afterSave)).toBe(false);
    await new Promise((r) => setTimeout(r, 1100));
    expect((await pdf()).equals(approved)).toBe(true);
  }, 300_000);
});
