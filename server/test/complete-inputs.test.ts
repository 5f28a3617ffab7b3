import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import {
  createSheet,
  createSheetsContext,
  getRevision,
  makeRegister,
  type Register,
  type SheetsContext,
} from './sheets-fixture.js';

type FieldIssue = { path: string; message: string };
const fieldsOf = (body: { error: { fields?: FieldIssue[] } }) => body.error.fields ?? [];

// The scenario that found the hole: a revision saved and submitted with `load` left out and an
// unknown key `bogusField` was accepted, and the core quietly used a load of its own.
describe('revisions: only complete, known inputs reach a frozen record', () => {
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

  const save = (rev: { id: string; rowVersion: number }, inputs: Record<string, unknown>) =>
    ctx.request('PUT', `/api/revisions/${rev.id}`, {
      as: 'engineer',
      body: { inputs, unitSystem: 'SI', changeNote: 'Inputs.', rowVersion: rev.rowVersion },
    });
  const trySubmit = (rev: { id: string; rowVersion: number }) =>
    ctx.request('POST', `/api/revisions/${rev.id}/submit`, {
      as: 'engineer',
      body: { rowVersion: rev.rowVersion, justification: 'Test justification.' },
    });

  it('refuses an unknown key on save, naming it, with "did you mean" when close', async () => {
    const sheet = await createSheet(ctx, reg);
    const rev = await getRevision(ctx, sheet.revisions[0].id);
    const { load: _load, ...withoutLoad } = rev.inputs;
    const res = await save(rev, { ...withoutLoad, bogusField: 1, sprngRate: '40 N/mm' });
    expect(res.status, res.text).toBe(400);
    const fields = fieldsOf(res.body);
    expect(fields.map((f) => f.path).sort()).toEqual(['inputs.bogusField', 'inputs.sprngRate']);
    expect(fields.find((f) => f.path === 'inputs.sprngRate')!.message).toMatch(
      /did you mean "springRate"/,
    );
    expect(fields.find((f) => f.path === 'inputs.bogusField')!.message).toMatch(
      /not a field of this sheet type$/,
    );
    const after = await getRevision(ctx, rev.id);
    expect(after.rowVersion).toBe(rev.rowVersion);
    expect(after.inputs).toEqual(rev.inputs);
  });

  it('keeps an incomplete draft, refuses to submit it listing each missing field, and never uses a value of its own', async () => {
    const sheet = await createSheet(ctx, reg);
    const rev = await getRevision(ctx, sheet.revisions[0].id);
    const { load: _load, springRate: _k, ...incomplete } = rev.inputs;
    const saved = await save(rev, incomplete);
    expect(saved.status, saved.text).toBe(200);
    // No preview of an incomplete draft: there is nothing honest to show.
    expect(saved.body.evaluation).toBeNull();
    expect(saved.body.inputs).not.toHaveProperty('load');

    const refused = await trySubmit(saved.body);
    expect(refused.status, refused.text).toBe(400);
    expect(fieldsOf(refused.body)).toEqual([
      { path: 'inputs.load', message: 'required: enter a value' },
      { path: 'inputs.springRate', message: 'required: enter a value' },
    ]);
    expect((await getRevision(ctx, rev.id)).state).toBe('draft');
  });

  it('freezes the inputs the core used, as entered and in SI', async () => {
    const sheet = await createSheet(ctx, reg);
    const rev = await getRevision(ctx, sheet.revisions[0].id);
    const saved = await save(rev, { ...rev.inputs, load: { value: 8, unit: 't' } });
    expect(saved.status, saved.text).toBe(200);
    const res = await trySubmit(saved.body);
    expect(res.status, res.text).toBe(200);
    const resolved = res.body.evaluation.resolvedInputs as {
      key: string;
      entered: unknown;
      si: unknown;
      siUnit: string;
    }[];
    expect(resolved.map((r) => r.key).sort()).toEqual(Object.keys(rev.inputs).sort());
    const load = resolved.find((r) => r.key === 'load')!;
    expect(load.entered).toEqual({ value: 8, unit: 't' });
    expect(load.si).toBeCloseTo(8000, 9);
    expect(load.siUnit).toBe('kg');
  });
});
