import { describe, expect, it } from 'vitest';
import { AuditRepository } from '../src/audit/audit.repository.js';
import { UnitOfWork } from '../src/database/unit-of-work.js';
import { RevisionsRepository } from '../src/revisions/revisions.repository.js';
import { approve, createSheet, sheetsSuite, submit } from './sheets-fixture.js';

const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** RevisionsRepository and the audit read it relies on, on the real, migrated database. */
describe('RevisionsRepository', () => {
  const s = sheetsSuite();
  const repo = () => s.ctx.app.get(RevisionsRepository);
  const units = () => s.ctx.app.get(UnitOfWork);

  /** A sheet whose revision A is approved and B is an open draft. */
  async function approvedThenDraft() {
    const sheet = await createSheet(s.ctx, s.reg);
    const a = sheet.revisions[0]!.id;
    await submit(s.ctx, a);
    await approve(s.ctx, a);
    const res = await s.ctx.request('POST', `/api/sheets/${sheet.id}/revisions`, {
      as: 'engineer',
      body: { changeNote: 'Second issue.' },
    });
    expect(res.status, res.text).toBe(201);
    return { sheetId: sheet.id, a, b: res.body.id as string };
  }

  it('reads the latest, the list in order, and the last submitted before a sequence', async () => {
    const { sheetId, a, b } = await approvedThenDraft();
    expect((await repo().latestForSheet(sheetId)).id).toBe(b);
    expect((await repo().listForSheet(sheetId)).map((r) => r.id)).toEqual([a, b]);
    // B was never submitted: a third revision is compared with A, and A with nothing.
    expect((await repo().previousSubmitted(sheetId, 3))?.label).toBe('A');
    expect(await repo().previousSubmitted(sheetId, 1)).toBeUndefined();
    // The database keeps one open revision per sheet: a second draft beside B is refused.
    const latest = await repo().latestForSheet(sheetId);
    const third = {
      sheetId,
      seq: 3,
      label: 'C',
      inputs: JSON.stringify(latest.inputs),
      unitSystem: latest.unitSystem,
      criteriaSetId: latest.criteriaSetId,
      criteriaSetVersion: latest.criteriaSetVersion,
      authorId: latest.authorId,
      changeNote: 'Third.',
    };
    await expect(units().run((tx) => repo().insert(third, tx))).rejects.toThrow(/one_open/);
    await s.ctx.db.deleteFrom('revisions').where('id', '=', b).execute();
    const c = await units().run((tx) => repo().insert(third, tx));
    expect(await repo().find(c)).toMatchObject({ label: 'C', sheetId, state: 'draft' });
    expect(await repo().find('00000000-0000-4000-8000-000000000000')).toBeUndefined();
  });

  it('the approved revision is locked until its transaction ends; none when nothing is approved', async () => {
    const { sheetId, a } = await approvedThenDraft();
    let release!: () => void;
    const held = new Promise<void>((r) => (release = r));
    let firstGot: string | undefined;
    const first = units().run(async (tx) => {
      firstGot = (await repo().approvedForUpdate(sheetId, tx))?.id;
      await held;
    });
    while (firstGot === undefined) await pause(10);
    expect(firstGot).toBe(a);
    let second: string | undefined | null = null;
    const waiting = units().run(async (tx) => {
      second = (await repo().approvedForUpdate(sheetId, tx))?.id;
    });
    await pause(300);
    expect(second).toBeNull(); // still waiting for the first transaction's lock
    release();
    await Promise.all([first, waiting]);
    expect(second).toBe(a);
    const other = await createSheet(s.ctx, s.reg, { title: 'Nothing approved' });
    expect(await units().run((tx) => repo().approvedForUpdate(other.id, tx))).toBeUndefined();
  });

  it('a stale row version changes nothing; a change rolls back with its unit of work', async () => {
    const { b } = await approvedThenDraft();
    const before = (await repo().find(b))!;
    await units().run((tx) =>
      repo().updateAtVersion(b, before.rowVersion - 1, { changeNote: 'stale' }, tx),
    );
    expect((await repo().find(b))?.changeNote).toBe('Second issue.');
    await units().run((tx) =>
      repo().updateAtVersion(
        b,
        before.rowVersion,
        { changeNote: 'current', rowVersion: before.rowVersion + 1 },
        tx,
      ),
    );
    expect((await repo().find(b))?.changeNote).toBe('current');
    await expect(
      units().run(async (tx) => {
        await repo().update(b, { changeNote: 'abandoned' }, tx);
        await repo().setSheetCriteriaSet(before.sheetId, 'no-such-set', tx);
      }),
    ).rejects.toThrow();
    expect((await repo().find(b))?.changeNote).toBe('current');
  });

  it('keeps a comment on the revision and moves the sheet to another criteria set', async () => {
    const { sheetId, b } = await approvedThenDraft();
    const checker = await s.ctx.userId('checker');
    const id = await units().run((tx) => repo().addComment(b, checker, 'Reason to return.', tx));
    const row = await s.ctx.db
      .selectFrom('comments')
      .selectAll()
      .where('id', '=', id)
      .executeTakeFirstOrThrow();
    expect(row).toMatchObject({ revisionId: b, authorId: checker, body: 'Reason to return.' });
    const sets = await s.ctx.db.selectFrom('criteriaSets').select('id').execute();
    const current = (await repo().find(b))!.criteriaSetId;
    const another = sets.map((x) => x.id).find((x) => x !== current)!;
    await units().run((tx) => repo().setSheetCriteriaSet(sheetId, another, tx));
    const sheet = await s.ctx.db
      .selectFrom('sheets')
      .select('criteriaSetId')
      .where('id', '=', sheetId)
      .executeTakeFirstOrThrow();
    expect(sheet.criteriaSetId).toBe(another);
  });

  it('AuditRepository.eventsFor: one entity and action, newest first', async () => {
    const { a, b } = await approvedThenDraft();
    const audit = s.ctx.app.get(AuditRepository);
    const submits = await audit.eventsFor(a, 'revision.submitted');
    expect(submits).toHaveLength(1);
    expect(Object.keys(submits[0]!).sort()).toEqual(['at', 'before']);
    expect((submits[0]!.before as { state: string }).state).toBe('draft');
    expect(await audit.eventsFor(b, 'revision.submitted')).toEqual([]);
    const saves = await audit.eventsFor(a, 'revision.saved');
    expect(saves.length).toBeGreaterThan(0);
    const times = saves.map((e) => e.at.getTime());
    expect([...times].sort((x, y) => y - x)).toEqual(times);
  });
});
