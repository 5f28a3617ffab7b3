import { describe, expect, it } from 'vitest';
import { createSheet, getRevision, submit, sheetsSuite } from './sheets-fixture.js';

describe('optimistic concurrency', () => {
  const s = sheetsSuite();

  it('two saves of the same version: one wins, the other gets 409 with the current version', async () => {
    const sheet = await createSheet(s.ctx, s.reg);
    const rev = await getRevision(s.ctx, sheet.revisions[0].id);
    const save = (note: string) =>
      s.ctx.request('PUT', `/api/revisions/${rev.id}`, {
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
    expect((await getRevision(s.ctx, rev.id)).changeNote).toBe(won.body.changeNote);
  });

  it('a stale save after another save is refused, never silently overwriting', async () => {
    const sheet = await createSheet(s.ctx, s.reg);
    const rev = await getRevision(s.ctx, sheet.revisions[0].id);
    const body = { inputs: rev.inputs, unitSystem: 'SI', rowVersion: rev.rowVersion };
    expect(
      (
        await s.ctx.request('PUT', `/api/revisions/${rev.id}`, {
          as: 'engineer',
          body: { ...body, changeNote: 'one' },
        })
      ).status,
    ).toBe(200);
    const stale = await s.ctx.request('PUT', `/api/revisions/${rev.id}`, {
      as: 'engineer',
      body: { ...body, changeNote: 'two' },
    });
    expect(stale.status).toBe(409);
    expect((await getRevision(s.ctx, rev.id)).changeNote).toBe('one');
  });

  it('two checkers approving at once: exactly one succeeds', async () => {
    const sheet = await createSheet(s.ctx, s.reg);
    const id = sheet.revisions[0].id;
    await submit(s.ctx, id);
    const rv = (await getRevision(s.ctx, id, 'checker')).rowVersion;
    const results = await Promise.all([
      s.ctx.request('POST', `/api/revisions/${id}/approve`, {
        as: 'checker',
        body: { rowVersion: rv },
      }),
      s.ctx.request('POST', `/api/revisions/${id}/return`, {
        as: 'checker2',
        body: { rowVersion: rv, comment: 'No.' },
      }),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
  });

  it('two new revisions at once: one draft, one 409', async () => {
    const sheet = await createSheet(s.ctx, s.reg);
    const id = sheet.revisions[0].id;
    await submit(s.ctx, id);
    const rv = (await getRevision(s.ctx, id, 'checker')).rowVersion;
    await s.ctx.request('POST', `/api/revisions/${id}/approve`, {
      as: 'checker',
      body: { rowVersion: rv },
    });
    const make = () =>
      s.ctx.request('POST', `/api/sheets/${sheet.id}/revisions`, {
        as: 'engineer',
        body: { changeNote: 'Next.' },
      });
    const results = await Promise.all([make(), make()]);
    expect(results.map((r) => r.status).sort()).toEqual([201, 409]);
  });
});
