import { sql } from 'kysely';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import {
  approve,
  createSheet,
  createSheetsContext,
  getRevision,
  makeRegister,
  submit,
  type Register,
  type SheetsContext,
} from './sheets-fixture.js';

/** Save the revision's inputs with one number changed, as `as`. */
async function editInputs(ctx: SheetsContext, id: string, as: 'checker' | 'engineer') {
  const rev = await getRevision(ctx, id, as);
  const inputs = { ...rev.inputs };
  const key = Object.keys(inputs).find((k) => typeof inputs[k] === 'number')!;
  inputs[key] = (inputs[key] as number) * 1.01;
  const res = await ctx.request('PUT', `/api/revisions/${id}`, {
    as,
    body: { inputs, unitSystem: 'SI', changeNote: 'Edited.', rowVersion: rev.rowVersion },
  });
  expect(res.status, res.text).toBe(200);
}

describe('four-eyes by person', () => {
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

  /** A sheet owned by the checker, rev. A approved by checker2, rev. B drafted by the engineer. */
  async function ownerCheckerScenario() {
    const sheet = await createSheet(ctx, reg, { as: 'checker' });
    await submit(ctx, sheet.revisions[0].id, 'checker');
    await approve(ctx, sheet.revisions[0].id, 'checker2');
    const b = await ctx.request('POST', `/api/sheets/${sheet.id}/revisions`, {
      as: 'engineer',
      body: { changeNote: 'Revision B by the engineer.' },
    });
    expect(b.status, b.text).toBe(201);
    expect(b.body.author.id).toBe(await ctx.userId('engineer'));
    return { sheetId: sheet.id, bId: b.body.id as string };
  }

  it('refuses the owner-checker who edited and submitted revision B (403), and lets another checker approve', async () => {
    const { bId } = await ownerCheckerScenario();
    await editInputs(ctx, bId, 'checker');
    await submit(ctx, bId, 'checker');
    const seen = await getRevision(ctx, bId, 'checker');
    expect(seen.canCheck).toBe(false);
    const refused = await ctx.request('POST', `/api/revisions/${bId}/approve`, {
      as: 'checker',
      body: { rowVersion: seen.rowVersion },
    });
    expect(refused.status).toBe(403);
    expect(refused.body.error.message).toMatch(/Four eyes: you edited and submitted revision B/);
    const queue = await ctx.request('GET', '/api/work-queue', { as: 'checker' });
    expect(
      queue.body.awaitingMyCheck.map((q: { revisionId: string }) => q.revisionId),
    ).not.toContain(bId);
    expect((await getRevision(ctx, bId, 'checker2')).canCheck).toBe(true);
    await approve(ctx, bId, 'checker2');
  });

  it('refuses a checker who only submitted, and one who only edited', async () => {
    const { bId } = await ownerCheckerScenario();
    await submit(ctx, bId, 'checker');
    const rev = await getRevision(ctx, bId, 'checker');
    const submitted = await ctx.request('POST', `/api/revisions/${bId}/approve`, {
      as: 'checker',
      body: { rowVersion: rev.rowVersion },
    });
    expect(submitted.status).toBe(403);
    expect(submitted.body.error.message).toMatch(/you submitted revision B/);
    const back = await ctx.request('POST', `/api/revisions/${bId}/return`, {
      as: 'checker2',
      body: { rowVersion: rev.rowVersion, comment: 'Please look again.' },
    });
    expect(back.status, back.text).toBe(200);
    // The engineer resubmits; the checker's earlier submission still bars them.
    await submit(ctx, bId, 'engineer');
    const again = await getRevision(ctx, bId, 'checker');
    expect(
      (
        await ctx.request('POST', `/api/revisions/${bId}/approve`, {
          as: 'checker',
          body: { rowVersion: again.rowVersion },
        })
      ).status,
    ).toBe(403);
  });

  it('the database refuses the same approval by raw SQL, and keeps the lists growing', async () => {
    const { bId } = await ownerCheckerScenario();
    await editInputs(ctx, bId, 'checker');
    await submit(ctx, bId, 'engineer');
    const checkerId = await ctx.userId('checker');
    await expect(
      sql`update revisions set state = 'approved', checker_id = ${checkerId}, approved_at = now()
        where id = ${bId}`.execute(ctx.db),
    ).rejects.toThrow(/revisions_four_eyes_check/);
    await expect(
      sql`update revisions set editor_ids = '{}' where id = ${bId}`.execute(ctx.db),
    ).rejects.toThrow(/keeps everyone/);
    // A checker with no part in it may (through the API, which also supersedes A).
    await approve(ctx, bId, 'checker2');
    const row = await ctx.db
      .selectFrom('revisions')
      .select(['state', 'editorIds', 'submitterIds'])
      .where('id', '=', bId)
      .executeTakeFirstOrThrow();
    expect(row).toEqual({
      state: 'approved',
      editorIds: [checkerId],
      submitterIds: [await ctx.userId('engineer')],
    });
  });
});
