import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import {
  createSheet,
  createSheetsContext,
  getRevision,
  makeRegister,
  submit,
  type Register,
  type SheetsContext,
} from './sheets-fixture.js';

describe('optimistic concurrency', () => {
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

  it('two saves of the same version: one wins, the other gets 409 with the current version', async () => {
    const sheet = await createSheet(ctx, reg);
    const rev = await getRevision(ctx, sheet.revisions[0].id);
    const save = (note: string) =>
      ctx.request('PUT', `/api/revisions/${rev.id}`, {
        as: 'engineer',
        body: {
          inputs: rev.inputs,
          unitSystem: 'SI',
          changeNote: note,
          rowVersion: rev.rowVersion,
        },
      });
    const results = await Promise.all([save('first'), save('second')]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
    const lost = results.find((r) => r.status === 409)!;
    expect(lost.body.error.code).toBe('conflict');
    expect(lost.body.error.details.currentRowVersion).toBe(rev.rowVersion + 1);
    const won = results.find((r) => r.status === 200)!;
    expect((await getRevision(ctx, rev.id)).changeNote).toBe(won.body.changeNote);
  });

  it('a stale save after another save is refused, never silently overwriting', async () => {
    const sheet = await createSheet(ctx, reg);
    const rev = await getRevision(ctx, sheet.revisions[0].id);
    const body = { inputs: rev.inputs, unitSystem: 'SI', rowVersion: rev.rowVersion };
    expect(
      (
        await ctx.request('PUT', `/api/revisions/${rev.id}`, {
          as: 'engineer',
          body: { ...body, changeNote: 'one' },
        })
      ).status,
    ).toBe(200);
    const stale = await ctx.request('PUT', `/api/revisions/${rev.id}`, {
      as: 'engineer',
      body: { ...body, changeNote: 'two' },
    });
    expect(stale.status).toBe(409);
    expect((await getRevision(ctx, rev.id)).changeNote).toBe('one');
  });

  it('two checkers approving at once: exactly one succeeds', async () => {
    const sheet = await createSheet(ctx, reg);
    const id = sheet.revisions[0].id;
    await submit(ctx, id);
    const rv = (await getRevision(ctx, id, 'checker')).rowVersion;
    const results = await Promise.all([
      ctx.request('POST', `/api/revisions/${id}/approve`, {
        as: 'checker',
        body: { rowVersion: rv },
      }),
      ctx.request('POST', `/api/revisions/${id}/return`, {
        as: 'checker2',
        body: { rowVersion: rv, comment: 'No.' },
      }),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
  });

  it('two new revisions at once: one draft, one 409', async () => {
    const sheet = await createSheet(ctx, reg);
    const id = sheet.revisions[0].id;
    await submit(ctx, id);
    const rv = (await getRevision(ctx, id, 'checker')).rowVersion;
    await ctx.request('POST', `/api/revisions/${id}/approve`, {
      as: 'checker',
      body: { rowVersion: rv },
    });
    const make = () =>
      ctx.request('POST', `/api/sheets/${sheet.id}/revisions`, {
        as: 'engineer',
        body: { changeNote: 'Next.' },
      });
    const results = await Promise.all([make(), make()]);
    expect(results.map((r) => r.status).sort()).toEqual([201, 409]);
  });
});
