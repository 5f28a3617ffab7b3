import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { UnitOfWork } from '../src/database/unit-of-work.js';
import { FieldRecordSigningRepository } from '../src/field-records/field-record-signing.repository.js';
import { FieldRecordsRepository } from '../src/field-records/field-records.repository.js';
import { UsersRepository } from '../src/users/users.repository.js';
import { approve, createSheet, sheetsSuite, submit } from './sheets-fixture.js';
import { demoEmail } from './test-context.js';

const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** FieldRecordsRepository inside the services' units of work, on the real database. */
describe('FieldRecordsRepository with a Tx', () => {
  const s = sheetsSuite();
  const repo = () => s.ctx.app.get(FieldRecordsRepository);
  const units = () => s.ctx.app.get(UnitOfWork);

  async function draftRecord() {
    const sheet = await createSheet(s.ctx, s.reg);
    const rev = await submit(s.ctx, sheet.revisions[0]!.id);
    await approve(s.ctx, rev.id);
    const id = randomUUID();
    const row = {
      id,
      positionId: s.reg.positionId,
      revisionId: rev.id as string,
      kind: 'periodic-inspection',
      performedAt: '2026-11-30T09:00:00Z',
      meterHours: null,
      findings: '',
      outOfTolerance: false,
      createdBy: await s.ctx.userId('technician'),
    };
    return { id, row, revisionId: rev.id as string };
  }

  it('insert is once per id; what a failed unit wrote is gone with it', async () => {
    const { id, row } = await draftRecord();
    expect(await units().run((tx) => repo().insert(tx, row))).toBe(true);
    expect(await units().run((tx) => repo().insert(tx, row))).toBe(false);
    const other = { ...row, id: randomUUID() };
    await expect(
      units().run(async (tx) => {
        await repo().insert(tx, other);
        await repo().replaceChecks(tx, other.id, [
          { key: 'no-drag-shoe-a', result: 'ok', value: null, cycles: null, note: '' },
        ]);
        throw new Error('abandoned');
      }),
    ).rejects.toThrow('abandoned');
    expect(await repo().load(other.id)).toBeUndefined();
    const stored = (await repo().load(id))!;
    expect(stored.record.kind).toBe('periodic-inspection');
    expect(stored.checks).toEqual([]);
  });

  it('reads inside a unit see its own writes; others see them after commit', async () => {
    const { id, row } = await draftRecord();
    await units().run((tx) => repo().insert(tx, row));
    await units().run(async (tx) => {
      await repo().update(tx, id, { findings: 'Lining worn evenly.' });
      expect((await repo().load(id, tx))?.record.findings).toBe('Lining worn evenly.');
      expect((await repo().load(id))?.record.findings).toBe('');
    });
    expect((await repo().load(id))?.record.findings).toBe('Lining worn evenly.');
  });

  it('lockForUpdate holds the record until the unit ends', async () => {
    const { id, row } = await draftRecord();
    await units().run((tx) => repo().insert(tx, row));
    let release!: () => void;
    const held = new Promise<void>((r) => (release = r));
    let locked = false;
    const first = units().run(async (tx) => {
      expect((await repo().lockForUpdate(tx, id))?.status).toBe('draft');
      locked = true;
      await held;
      await repo().update(tx, id, { kind: 're-adjustment' });
    });
    while (!locked) await pause(10);
    let seen: string | undefined;
    const second = units().run(async (tx) => {
      seen = (await repo().lockForUpdate(tx, id))?.kind;
    });
    await pause(300);
    expect(seen).toBeUndefined(); // still waiting for the first unit
    release();
    await Promise.all([first, second]);
    expect(seen).toBe('re-adjustment');
  });

  it('signing: codes shared with revisions are taken; a code names its record; rolled back signatures', async () => {
    const signing = s.ctx.app.get(FieldRecordSigningRepository);
    const { id, row, revisionId } = await draftRecord();
    await units().run((tx) => repo().insert(tx, row));
    const revCode = (
      await s.ctx.db
        .selectFrom('revisions')
        .select('verificationCode')
        .where('id', '=', revisionId)
        .executeTakeFirstOrThrow()
    ).verificationCode!;
    expect(await signing.verificationCodeTaken(revCode)).toBe(true);
    expect(await signing.verificationCodeTaken('FREE-CODE-0000')).toBe(false);
    expect(await signing.byVerificationCode('FREE-CODE-0000')).toBeUndefined();
    const technician = await s.ctx.userId('technician');
    const signature = {
      recordId: id,
      kind: 'technician' as const,
      userId: technician,
      displayName: 'Tech',
      initials: 'TE',
    };
    await expect(
      units().run(async (tx) => {
        await repo().update(tx, id, { status: 'signed', verificationCode: 'FREE-CODE-0000' });
        await signing.addSignature(signature, tx);
        throw new Error('abandoned');
      }),
    ).rejects.toThrow('abandoned');
    expect(await signing.verificationCodeTaken('FREE-CODE-0000')).toBe(false);
    expect((await repo().load(id))?.signatures).toEqual([]);
    await units().run(async (tx) => {
      await repo().update(tx, id, { status: 'signed', verificationCode: 'FREE-CODE-0000' });
      await signing.addSignature(signature, tx);
    });
    expect(await signing.byVerificationCode('FREE-CODE-0000')).toEqual({ id });
    expect((await repo().load(id))?.signatures.map((x) => x.kind)).toEqual(['technician']);
  });

  it('signing: the owner and active plant engineers hear of it, never the signer', async () => {
    const signing = s.ctx.app.get(FieldRecordSigningRepository);
    const [owner, checker, technician] = await Promise.all(
      (['engineer', 'checker', 'technician'] as const).map((w) => s.ctx.userId(w)),
    );
    const all = await signing.notifyEmails(owner, technician);
    expect(all).toContain(demoEmail('engineer'));
    expect(all).toContain(demoEmail('checker'));
    expect(all).not.toContain(demoEmail('technician'));
    // The plant engineer (viewer role) countersigns, so hears of it too; an admin does not.
    expect(all).toContain(demoEmail('viewer'));
    expect(all).not.toContain(demoEmail('admin'));
    expect([...all].sort()).toEqual(all);
    await s.ctx.app.get(UsersRepository).update(checker, { active: false });
    expect(await signing.notifyEmails(owner, technician)).not.toContain(demoEmail('checker'));
    // Whoever signs does not hear of their own signature.
    const viewer = await s.ctx.userId('viewer');
    expect(await signing.notifyEmails(owner, viewer)).not.toContain(demoEmail('viewer'));
    expect(await signing.notifyEmails(viewer, owner)).not.toContain(demoEmail('engineer'));
  });
});
