import { describe, expect, it } from 'vitest';
import { UnitOfWork } from '../src/database/unit-of-work.js';
import { RegisterEditsRepository } from '../src/register/register-edits.repository.js';
import { RegisterRepository } from '../src/register/register.repository.js';
import { approve, createSheet, sheetsSuite, submit } from './sheets-fixture.js';

const none = '00000000-0000-4000-8000-000000000000';
const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** RegisterRepository and RegisterEditsRepository on the real, migrated database. */
describe('register repositories', () => {
  const s = sheetsSuite();
  const repo = () => s.ctx.app.get(RegisterRepository);
  const edits = () => s.ctx.app.get(RegisterEditsRepository);
  const units = () => s.ctx.app.get(UnitOfWork);

  it('reads sites by code, machines and positions by tag, with their shown columns only', async () => {
    const other = await units().run((tx) => repo().insertSite({ code: 'AAA', name: 'First' }, tx));
    expect(other).toEqual({ id: other.id, code: 'AAA', name: 'First' });
    expect((await repo().sites()).map((x) => x.code)).toEqual(['AAA', 'TST']);
    const m = await units().run((tx) =>
      repo().insertMachine({ siteId: other.id, tag: 'AB-00', name: 'Gantry', kind: 'crane' }, tx),
    );
    expect(Object.keys(m).sort()).toEqual(['id', 'kind', 'name', 'siteId', 'tag']);
    expect((await repo().machines()).map((x) => x.tag)).toEqual(['AB-00', 'CR-01']);
    const p = await units().run((tx) =>
      repo().insertPosition(
        { machineId: m.id, tag: 'AA-B1', description: 'Trolley brake', motion: 'travel' },
        tx,
      ),
    );
    const positions = await repo().positions();
    expect(positions.map((x) => x.tag)).toEqual(['AA-B1', 'MH-B1']);
    expect(Object.keys(positions[0]!).sort()).toEqual(
      ['brakeKind', 'description', 'id', 'lining', 'machineId', 'motion', 'tag', 'thruster'].sort(),
    );
    expect(positions[0]!.id).toBe(p.id);
  });

  it('tells which sites and machines exist; an insert rolls back with its unit', async () => {
    expect(await repo().siteExists(s.reg.siteId)).toBe(true);
    expect(await repo().siteExists(none)).toBe(false);
    expect(await repo().machineExists(s.reg.machineId)).toBe(true);
    expect(await repo().machineExists(none)).toBe(false);
    await expect(
      units().run(async (tx) => {
        await repo().insertSite({ code: 'GONE', name: 'Never kept' }, tx);
        throw new Error('abandoned');
      }),
    ).rejects.toThrow('abandoned');
    expect((await repo().sites()).map((x) => x.code)).toEqual(['TST']);
  });

  it('lists approved revisions in force and open sheets, each leaving the other out', async () => {
    const approved = await createSheet(s.ctx, s.reg, { title: 'Approved' });
    await submit(s.ctx, approved.revisions[0]!.id);
    await approve(s.ctx, approved.revisions[0]!.id);
    const open = await createSheet(s.ctx, s.reg, { title: 'Open' });
    const inForce = await repo().approvedSheets();
    expect(inForce.map((a) => a.sheetId)).toEqual([approved.id]);
    expect(inForce[0]).toMatchObject({
      positionId: s.reg.positionId,
      revisionId: approved.revisions[0]!.id,
      label: 'A',
      documentNumber: approved.documentNumber,
    });
    const opened = await repo().openSheets();
    expect(opened.map((o) => [o.id, o.state])).toEqual([[open.id, 'draft']]);
  });

  it('edits: the entry is locked until the change commits; unknown ids give nothing', async () => {
    expect(await units().run((tx) => edits().siteForUpdate(none, tx))).toBeUndefined();
    expect(await units().run((tx) => edits().machineForUpdate(none, tx))).toBeUndefined();
    expect(await units().run((tx) => edits().positionForUpdate(none, tx))).toBeUndefined();
    let release!: () => void;
    const held = new Promise<void>((r) => (release = r));
    let locked = false;
    const first = units().run(async (tx) => {
      expect(await edits().siteForUpdate(s.reg.siteId, tx)).toMatchObject({ code: 'TST' });
      locked = true;
      await held;
      await edits().updateSite(s.reg.siteId, { name: 'Renamed works' }, tx);
    });
    while (!locked) await pause(10);
    let seen: string | undefined;
    const second = units().run(async (tx) => {
      seen = (await edits().siteForUpdate(s.reg.siteId, tx))?.name;
    });
    await pause(300);
    expect(seen).toBeUndefined(); // waiting for the first unit
    release();
    await Promise.all([first, second]);
    expect(seen).toBe('Renamed works'); // the before of a second edit is the committed after
  });

  it('edits return the changed entry with its shown columns', async () => {
    const m = await units().run((tx) =>
      edits().updateMachine(s.reg.machineId, { name: 'Ladle crane 2' }, tx),
    );
    expect(m).toEqual({
      id: s.reg.machineId,
      siteId: s.reg.siteId,
      tag: 'CR-01',
      name: 'Ladle crane 2',
      kind: 'crane',
    });
    const p = await units().run((tx) =>
      edits().updatePosition(s.reg.positionId, { tag: 'MH-B9' }, tx),
    );
    expect(p).toMatchObject({
      id: s.reg.positionId,
      tag: 'MH-B9',
      description: 'Main hoist brake 1',
    });
    await expect(
      units().run((tx) => edits().updateSite(none, { name: 'x' }, tx)),
    ).rejects.toThrow();
  });
});
