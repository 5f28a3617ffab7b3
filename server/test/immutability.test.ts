import { sql } from 'kysely';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import {
  approve,
  createSheet,
  createSheetsContext,
  makeRegister,
  submit,
  type SheetsContext,
} from './sheets-fixture.js';

describe('immutability in the database (raw SQL)', () => {
  let ctx: SheetsContext;
  let approvedId: string;
  let inCheckId: string;
  let draftId: string;
  beforeAll(async () => {
    ctx = await createSheetsContext();
  });
  beforeEach(async () => {
    await ctx.resetAll();
    const reg = await makeRegister(ctx);
    const one = await createSheet(ctx, reg);
    approvedId = one.revisions[0].id;
    await submit(ctx, approvedId);
    await approve(ctx, approvedId);
    const two = await createSheet(ctx, reg, { title: 'Second' });
    inCheckId = two.revisions[0].id;
    await submit(ctx, inCheckId);
    draftId = (await createSheet(ctx, reg, { title: 'Third' })).revisions[0].id;
  });
  afterAll(() => ctx?.closeAll());

  const run = (q: ReturnType<typeof sql>) => q.execute(ctx.db);

  it.each([
    ['inputs', sql`update revisions set inputs = '{}'::jsonb where id = `],
    ['evaluation', sql`update revisions set evaluation = '{"pass":true}'::jsonb where id = `],
    ['hash', sql`update revisions set hash = repeat('0', 64) where id = `],
    ['checker', sql`update revisions set checker_id = author_id where id = `],
    ['state back to draft', sql`update revisions set state = 'draft' where id = `],
    ['change note', sql`update revisions set change_note = 'rewritten' where id = `],
  ])('an approved revision refuses an UPDATE of %s', async (_what, prefix) => {
    await expect(run(sql`${prefix}${approvedId}`)).rejects.toThrow(/immutable/);
  });

  it('an approved revision refuses DELETE', async () => {
    await expect(run(sql`delete from revisions where id = ${approvedId}`)).rejects.toThrow(
      /cannot be deleted/,
    );
  });

  it('approved → superseded may touch only the superseded fields', async () => {
    await expect(
      run(
        sql`update revisions set state = 'superseded', superseded_at = now(), inputs = '{}'::jsonb where id = ${approvedId}`,
      ),
    ).rejects.toThrow(/immutable/);
    await run(
      sql`update revisions set state = 'superseded', superseded_at = now() where id = ${approvedId}`,
    );
    await expect(
      run(sql`update revisions set state = 'approved' where id = ${approvedId}`),
    ).rejects.toThrow(/immutable/);
    await expect(
      run(sql`update revisions set superseded_at = now() where id = ${approvedId}`),
    ).rejects.toThrow(/immutable/);
  });

  it('an in-check revision keeps its content but may change state', async () => {
    await expect(
      run(sql`update revisions set inputs = '{}'::jsonb where id = ${inCheckId}`),
    ).rejects.toThrow(/in check/);
    await expect(
      run(sql`update revisions set hash = repeat('1', 64) where id = ${inCheckId}`),
    ).rejects.toThrow(/in check/);
    await expect(run(sql`delete from revisions where id = ${inCheckId}`)).rejects.toThrow(
      /cannot be deleted/,
    );
  });

  it('a draft is freely editable', async () => {
    await run(sql`update revisions set change_note = 'edited' where id = ${draftId}`);
  });

  it('only one approved revision per sheet, and an approval needs a checker other than the author', async () => {
    await expect(
      run(sql`update revisions set state = 'approved' where id = ${inCheckId}`),
    ).rejects.toThrow(/revisions_approved_complete_check/);
  });

  it('the audit trail refuses UPDATE and DELETE', async () => {
    await expect(run(sql`update audit_events set action = 'forged'`)).rejects.toThrow(
      /append-only/,
    );
    await expect(run(sql`delete from audit_events`)).rejects.toThrow(/append-only/);
  });

  it('a published criteria-set version refuses UPDATE and DELETE', async () => {
    await expect(run(sql`update criteria_set_versions set note = 'x'`)).rejects.toThrow(
      /cannot change/,
    );
    await expect(run(sql`delete from criteria_set_versions`)).rejects.toThrow(/cannot change/);
  });
});
