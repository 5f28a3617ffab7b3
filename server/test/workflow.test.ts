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

const put = (
  ctx: SheetsContext,
  rev: { id: string; inputs: unknown; rowVersion: number },
  as: any,
  extra = {},
) =>
  ctx.request('PUT', `/api/revisions/${rev.id}`, {
    as,
    body: {
      inputs: rev.inputs,
      unitSystem: 'SI',
      changeNote: 'Edited.',
      rowVersion: rev.rowVersion,
      ...extra,
    },
  });

describe('revision workflow', () => {
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

  it('creates a sheet with a readable document number and a draft A with defaults', async () => {
    const sheet = await createSheet(ctx, reg, { confirm: false });
    expect(sheet.documentNumber).toBe('HF-TST-0001');
    expect(sheet.revisions).toHaveLength(1);
    expect(sheet.revisions[0]).toMatchObject({ label: 'A', state: 'draft' });
    const second = await createSheet(ctx, reg, { title: 'Second brake' });
    expect(second.documentNumber).toBe('HF-TST-0002');
    const rev = await getRevision(ctx, sheet.revisions[0].id);
    expect(Object.keys(rev.inputs).length).toBeGreaterThan(0);
    expect(rev).toMatchObject({
      canEdit: true,
      canSubmit: true,
      canCheck: false,
      rowVersion: 0,
      hash: null,
    });
  });

  it('lets only the author or owner edit a draft; viewers and admins are refused by role', async () => {
    const sheet = await createSheet(ctx, reg, { confirm: false });
    const rev = await getRevision(ctx, sheet.revisions[0].id);
    expect((await put(ctx, rev, 'engineer2')).status).toBe(403);
    expect((await put(ctx, rev, 'checker')).status).toBe(403);
    expect((await put(ctx, rev, 'viewer')).status).toBe(403);
    expect((await put(ctx, rev, 'admin')).status).toBe(403);
    const ok = await put(ctx, rev, 'engineer');
    expect(ok.status, ok.text).toBe(200);
    expect(ok.body.rowVersion).toBe(1);
    expect(ok.body.evaluation).not.toBeNull();
  });

  it('hides draft content from viewers but shows it to engineers', async () => {
    const sheet = await createSheet(ctx, reg);
    const id = sheet.revisions[0].id;
    expect((await ctx.request('GET', `/api/revisions/${id}`, { as: 'viewer' })).status).toBe(403);
    expect((await ctx.request('GET', `/api/revisions/${id}`, { as: 'engineer2' })).status).toBe(
      200,
    );
  });

  it('submit freezes the revision with hash, code and the server evaluation', async () => {
    const sheet = await createSheet(ctx, reg);
    const id = sheet.revisions[0].id;
    const rev = await getRevision(ctx, id);
    const bad = await ctx.request('POST', `/api/revisions/${id}/submit`, {
      as: 'engineer2',
      body: { rowVersion: rev.rowVersion, justification: 'x' },
    });
    expect(bad.status).toBe(403);
    const viewer = await ctx.request('POST', `/api/revisions/${id}/submit`, {
      as: 'viewer',
      body: { rowVersion: 0 },
    });
    expect(viewer.status).toBe(403);
    const submitted = await submit(ctx, id);
    expect(submitted.state).toBe('in_check');
    expect(submitted.hash).toMatch(/^[0-9a-f]{64}$/);
    expect(submitted.verificationCode).toMatch(/^[A-Z2-7]{10}$/);
    expect(submitted.coreVersion).toMatch(/^\d+\.\d+\.\d+/);
    expect(submitted.submittedAt).not.toBeNull();
    expect(submitted.canEdit).toBe(false);
    // Frozen: no save, no second submit.
    expect((await put(ctx, submitted, 'engineer')).status).toBe(409);
    const again = await ctx.request('POST', `/api/revisions/${id}/submit`, {
      as: 'engineer',
      body: { rowVersion: submitted.rowVersion, justification: 'x' },
    });
    expect(again.status).toBe(409);
  });

  it('approve: checker only, never the author; previous approval is superseded', async () => {
    const sheet = await createSheet(ctx, reg);
    const a = sheet.revisions[0].id;
    await submit(ctx, a);
    const body = { rowVersion: (await getRevision(ctx, a, 'checker')).rowVersion };
    expect(
      (await ctx.request('POST', `/api/revisions/${a}/approve`, { as: 'engineer', body })).status,
    ).toBe(403);
    expect(
      (await ctx.request('POST', `/api/revisions/${a}/approve`, { as: 'engineer2', body })).status,
    ).toBe(403);
    expect(
      (await ctx.request('POST', `/api/revisions/${a}/approve`, { as: 'viewer', body })).status,
    ).toBe(403);
    expect(
      (await ctx.request('POST', `/api/revisions/${a}/approve`, { as: 'admin', body })).status,
    ).toBe(403);
    const approved = await approve(ctx, a, 'checker');
    expect(approved).toMatchObject({ state: 'approved', checker: { displayName: 'Mara Lind' } });
    expect(
      (
        await ctx.request('POST', `/api/revisions/${a}/approve`, {
          as: 'checker2',
          body: { rowVersion: approved.rowVersion },
        })
      ).status,
    ).toBe(409);

    const b = await ctx.request('POST', `/api/sheets/${sheet.id}/revisions`, {
      as: 'engineer2',
      body: { changeNote: 'Heavier ladle.' },
    });
    expect(b.status, b.text).toBe(201);
    expect(b.body).toMatchObject({
      label: 'B',
      state: 'draft',
      author: { displayName: 'Tomas Reed' },
    });
    expect(b.body.inputs).toEqual(approved.inputs);
    await submit(ctx, b.body.id, 'engineer2');
    await approve(ctx, b.body.id, 'checker2');
    const oldA = await getRevision(ctx, a);
    expect(oldA.state).toBe('superseded');
    expect(oldA.supersededBy).toMatchObject({ id: b.body.id, label: 'B' });
    const detail = await ctx.request('GET', `/api/sheets/${sheet.id}`, { as: 'viewer' });
    expect(detail.body.approved).toMatchObject({ id: b.body.id, label: 'B' });
    expect(detail.body.latest).toMatchObject({ label: 'B', state: 'approved' });
    expect(detail.body.revisions.map((r: { state: string }) => r.state)).toEqual([
      'superseded',
      'approved',
    ]);
  });

  it('a checker who authored a revision cannot approve it; another checker can', async () => {
    const sheet = await createSheet(ctx, reg, { as: 'checker' });
    const id = sheet.revisions[0].id;
    await submit(ctx, id, 'checker');
    const rev = await getRevision(ctx, id, 'checker');
    expect(rev.canCheck).toBe(false);
    const own = await ctx.request('POST', `/api/revisions/${id}/approve`, {
      as: 'checker',
      body: { rowVersion: rev.rowVersion },
    });
    expect(own.status).toBe(403);
    expect(own.body.error.message).toMatch(/own revision/);
    const ownReturn = await ctx.request('POST', `/api/revisions/${id}/return`, {
      as: 'checker',
      body: { rowVersion: rev.rowVersion, comment: 'Mine.' },
    });
    expect(ownReturn.status).toBe(403);
    expect((await getRevision(ctx, id, 'checker2')).canCheck).toBe(true);
    await approve(ctx, id, 'checker2');
  });

  it('return needs a comment, stores it, and the author can edit and resubmit', async () => {
    const sheet = await createSheet(ctx, reg);
    const id = sheet.revisions[0].id;
    await submit(ctx, id);
    let rev = await getRevision(ctx, id, 'checker');
    const empty = await ctx.request('POST', `/api/revisions/${id}/return`, {
      as: 'checker',
      body: { rowVersion: rev.rowVersion },
    });
    expect(empty.status).toBe(400);
    expect(empty.body.error.fields[0].path).toBe('comment');
    const returned = await ctx.request('POST', `/api/revisions/${id}/return`, {
      as: 'checker',
      body: { rowVersion: rev.rowVersion, comment: 'Use the worn-lining friction.' },
    });
    expect(returned.status, returned.text).toBe(200);
    expect(returned.body).toMatchObject({
      state: 'returned',
      checker: { displayName: 'Mara Lind' },
    });
    const comments = await ctx.request('GET', `/api/revisions/${id}/comments`, { as: 'engineer' });
    expect(comments.body.items.map((c: { body: string }) => c.body)).toEqual([
      'Use the worn-lining friction.',
    ]);
    rev = await getRevision(ctx, id);
    expect(rev.canEdit).toBe(true);
    const saved = await put(ctx, rev, 'engineer');
    expect(saved.status, saved.text).toBe(200);
    expect(saved.body).toMatchObject({ state: 'returned', hash: null, verificationCode: null });
    const resubmitted = await submit(ctx, id);
    expect(resubmitted.state).toBe('in_check');
    expect(resubmitted.verificationCode).not.toBe(returned.body.verificationCode);
  });

  it('refuses a new revision while one is open', async () => {
    const sheet = await createSheet(ctx, reg);
    const res = await ctx.request('POST', `/api/sheets/${sheet.id}/revisions`, {
      as: 'engineer',
      body: { changeNote: 'More.' },
    });
    expect(res.status).toBe(409);
    expect(res.body.error.details.openRevisionId).toBe(sheet.revisions[0].id);
    const viewer = await ctx.request('POST', `/api/sheets/${sheet.id}/revisions`, {
      as: 'viewer',
      body: { changeNote: 'More.' },
    });
    expect(viewer.status).toBe(403);
  });

  it('shows the work queue of each person', async () => {
    const sheet = await createSheet(ctx, reg);
    const id = sheet.revisions[0].id;
    let q = await ctx.request('GET', '/api/work-queue', { as: 'engineer' });
    expect(q.body.myDrafts.map((i: { revisionId: string }) => i.revisionId)).toEqual([id]);
    await submit(ctx, id);
    q = await ctx.request('GET', '/api/work-queue', { as: 'checker' });
    expect(q.body.awaitingMyCheck.map((i: { revisionId: string }) => i.revisionId)).toEqual([id]);
    q = await ctx.request('GET', '/api/work-queue', { as: 'engineer2' });
    expect(q.body.awaitingMyCheck).toEqual([]);
    const rev = await getRevision(ctx, id, 'checker');
    await ctx.request('POST', `/api/revisions/${id}/return`, {
      as: 'checker',
      body: { rowVersion: rev.rowVersion, comment: 'Fix.' },
    });
    q = await ctx.request('GET', '/api/work-queue', { as: 'engineer' });
    expect(q.body.returnedToMe.map((i: { revisionId: string }) => i.revisionId)).toEqual([id]);
    expect(q.body.myDrafts).toEqual([]);
  });
});
