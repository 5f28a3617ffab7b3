import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  approve,
  createSheet,
  createSheetsContext,
  makeRegister,
  submit,
  type SheetsContext,
} from '../../test/sheets-fixture.js';

// GET /api/revisions/:id/pdf and /field-card through the real app and database.
describe('print endpoints', () => {
  let ctx: SheetsContext;
  beforeAll(async () => {
    ctx = await createSheetsContext();
    await ctx.resetAll();
  }, 120_000);
  afterAll(() => ctx?.closeAll());

  it('serves the sheet and the field card as PDF, A4 or Letter, by the read rules of revisions', async () => {
    const reg = await makeRegister(ctx);
    const sheet = await createSheet(ctx, reg);
    const draftId = sheet.revisions[0].id;

    const draft = await ctx.request('GET', `/api/revisions/${draftId}/pdf`, { as: 'engineer' });
    expect(draft.status, draft.text.slice(0, 200)).toBe(200);
    expect(draft.headers.get('content-type')).toContain('application/pdf');
    expect(draft.text.startsWith('%PDF-')).toBe(true);
    expect(draft.headers.get('content-disposition')).toContain(
      `filename="${sheet.documentNumber}-rev-A-draft-calculation-sheet.pdf"`,
    );
    // A viewer reads approved revisions only.
    expect(
      (await ctx.request('GET', `/api/revisions/${draftId}/pdf`, { as: 'viewer' })).status,
    ).toBe(403);

    const a = await submit(ctx, draftId);
    await approve(ctx, a.id);
    for (const path of ['pdf?paper=LETTER', 'field-card', 'field-card?paper=A4']) {
      const res = await ctx.request('GET', `/api/revisions/${a.id}/${path}`, { as: 'viewer' });
      expect(res.status, `${path}: ${res.text.slice(0, 200)}`).toBe(200);
      expect(res.headers.get('content-type')).toContain('application/pdf');
      expect(res.headers.get('content-disposition')).toContain(
        `attachment; filename="${sheet.documentNumber}-rev-A-${path.startsWith('pdf') ? 'calculation-sheet' : 'field-card'}.pdf"`,
      );
    }
    const bad = await ctx.request('GET', `/api/revisions/${a.id}/pdf?paper=B5`, { as: 'viewer' });
    expect(bad.status).toBe(400);
    const missing = await ctx.request(
      'GET',
      '/api/revisions/00000000-0000-4000-8000-000000000000/pdf',
      {
        as: 'viewer',
      },
    );
    expect(missing.status).toBe(404);
    expect((await ctx.request('GET', `/api/revisions/${a.id}/pdf`)).status).toBe(401);
  }, 300_000);
});
