import { describe, expect, it } from 'vitest';
import { UnitOfWork } from '../src/database/unit-of-work.js';
import { SheetRowsRepository } from '../src/sheets/sheet-rows.repository.js';
import { createSheet, sheetsSuite } from './sheets-fixture.js';

const none = '00000000-0000-4000-8000-000000000000';
const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** SheetRowsRepository on the real, migrated database. */
describe('SheetRowsRepository', () => {
  const s = sheetsSuite();
  const rows = () => s.ctx.app.get(SheetRowsRepository);
  const units = () => s.ctx.app.get(UnitOfWork);

  it('finds a position with its motion, machine and site; nothing for an unknown one', async () => {
    expect(await rows().findPosition(s.reg.positionId)).toEqual({
      id: s.reg.positionId,
      tag: 'MH-B1',
      motion: 'hoist',
      machineId: s.reg.machineId,
      machineTag: 'CR-01',
      siteId: s.reg.siteId,
    });
    expect(await rows().findPosition(none)).toBeUndefined();
  });

  it('numbers documents per site in turn; a rolled-back unit gives its number back', async () => {
    const next = () => units().run((tx) => rows().nextDocumentNumber(s.reg.siteId, tx));
    expect(await next()).toBe('HF-TST-0001');
    await expect(
      units().run(async (tx) => {
        await rows().nextDocumentNumber(s.reg.siteId, tx);
        throw new Error('abandoned');
      }),
    ).rejects.toThrow('abandoned');
    expect(await next()).toBe('HF-TST-0002');
  });

  it('tells which criteria sets and sheets exist', async () => {
    const set = await s.ctx.db.selectFrom('criteriaSets').select('id').executeTakeFirstOrThrow();
    expect(await rows().criteriaSetExists(set.id)).toBe(true);
    expect(await rows().criteriaSetExists('no-such-set')).toBe(false);
    const sheet = await createSheet(s.ctx, s.reg, { confirm: false });
    expect(await rows().exists(sheet.id)).toBe(true);
    expect(await rows().exists(none)).toBe(false);
  });

  it('inserts a sheet in the unit of work, and locks it until that unit ends', async () => {
    const set = await s.ctx.db.selectFrom('criteriaSets').select('id').executeTakeFirstOrThrow();
    const owner = await s.ctx.userId('engineer');
    const id = await units().run((tx) =>
      rows().insert(
        {
          documentNumber: 'HF-TST-0900',
          title: 'Inserted',
          positionId: s.reg.positionId,
          machineId: s.reg.machineId,
          siteId: s.reg.siteId,
          tags: 'CR-01 MH-B1',
          sheetType: 'hoist-shoe-brake',
          ownerId: owner,
          criteriaSetId: set.id,
        },
        tx,
      ),
    );
    expect(await units().run((tx) => rows().findForUpdate(none, tx))).toBeUndefined();
    let release!: () => void;
    const held = new Promise<void>((r) => (release = r));
    let locked = false;
    const first = units().run(async (tx) => {
      expect((await rows().findForUpdate(id, tx))?.title).toBe('Inserted');
      locked = true;
      await held;
    });
    while (!locked) await pause(10);
    let second: string | undefined;
    const waiting = units().run(async (tx) => {
      second = (await rows().findForUpdate(id, tx))?.documentNumber;
    });
    await pause(300);
    expect(second).toBeUndefined(); // waits for the first unit's row lock
    release();
    await Promise.all([first, waiting]);
    expect(second).toBe('HF-TST-0900');
  });
});
