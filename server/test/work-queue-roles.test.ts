import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import {
  approve,
  createSheet,
  createSheetsContext,
  makeRegister,
  submit,
  type Register,
  type SheetsContext,
} from './sheets-fixture.js';

const ids = (items: { revisionId: string }[]) => items.map((i) => i.revisionId);

describe('each role’s work queue holds only what that role acts on', () => {
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

  it('a viewer and a fitter get newly approved sheets only; an admin nothing; authors their own', async () => {
    const draft = await createSheet(ctx, reg, { title: 'Still a draft' });
    const done = await createSheet(ctx, reg, { title: 'Approved one' });
    const a = done.revisions[0].id;
    await submit(ctx, a);
    await approve(ctx, a);

    const viewer = (await ctx.request('GET', '/api/work-queue', { as: 'viewer' })).body;
    expect(ids(viewer.recentlyApproved)).toEqual([a]);
    expect(viewer.myDrafts).toEqual([]);
    expect(viewer.returnedToMe).toEqual([]);
    expect(viewer.awaitingMyCheck).toEqual([]);

    const fitter = (await ctx.request('GET', '/api/work-queue', { as: 'technician' })).body;
    expect(ids(fitter.recentlyApproved)).toEqual([a]);
    expect(fitter.myDrafts).toEqual([]);
    expect(fitter.awaitingMyCheck).toEqual([]);

    const admin = (await ctx.request('GET', '/api/work-queue', { as: 'admin' })).body;
    expect(admin).toEqual({
      myDrafts: [],
      returnedToMe: [],
      awaitingMyCheck: [],
      recentlyApproved: [],
    });

    // engineer2 authored nothing, so nobody else's approval is theirs to act on.
    const other = (await ctx.request('GET', '/api/work-queue', { as: 'engineer2' })).body;
    expect(other.recentlyApproved).toEqual([]);
    const author = (await ctx.request('GET', '/api/work-queue', { as: 'engineer' })).body;
    expect(ids(author.recentlyApproved)).toEqual([a]);
    expect(ids(author.myDrafts)).toEqual([draft.revisions[0].id]);
  });
});
