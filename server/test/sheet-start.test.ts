import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import {
  approve,
  createSheetsContext,
  getRevision,
  makeRegister,
  submit,
  type Register,
  type SheetsContext,
} from './sheets-fixture.js';

type Start = { kind: 'empty' } | { kind: 'example' } | { kind: 'copy'; revisionId: string };

describe('starting a sheet honestly', () => {
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

  const create = async (start: Start | undefined, title = 'Main hoist brake') => {
    const res = await ctx.request('POST', '/api/sheets', {
      as: 'engineer',
      body: { title, positionId: reg.positionId, sheetType: 'hoist-shoe-brake', start },
    });
    expect(res.status, res.text).toBe(201);
    return getRevision(ctx, res.body.revisions[0].id);
  };
  const save = (rev: { id: string; rowVersion: number }, body: Record<string, unknown>) =>
    ctx.request('PUT', `/api/revisions/${rev.id}`, {
      as: 'engineer',
      body: { unitSystem: 'SI', changeNote: 'First issue.', rowVersion: rev.rowVersion, ...body },
    });
  const trySubmit = (rev: { id: string; rowVersion: number }) =>
    ctx.request('POST', `/api/revisions/${rev.id}/submit`, {
      as: 'engineer',
      body: { rowVersion: rev.rowVersion, justification: 'Checks reviewed for the test duty.' },
    });

  it('an empty sheet leaves every number blank, saves incomplete, and cannot be submitted so', async () => {
    const rev = await create({ kind: 'empty' });
    const blanks = Object.entries(rev.inputs).filter(([, v]) => v === '');
    expect(blanks.length).toBeGreaterThan(20);
    expect(rev.inputs.drumDiameter).toBe('');
    expect(rev.evaluation).toBeNull();
    // Choices hold a default nobody chose: they are the unconfirmed ones.
    expect(rev.unconfirmed.length).toBeGreaterThan(0);
    expect(rev.unconfirmed).not.toContain('drumDiameter');

    // One field entered, the rest still blank: the draft saves, without a preview.
    const partial = await save(rev, {
      inputs: { ...rev.inputs, drumDiameter: { value: 500, unit: 'mm' } },
    });
    expect(partial.status, partial.text).toBe(200);
    expect(partial.body.inputs.drumDiameter).toEqual({ value: 500, unit: 'mm' });
    expect(partial.body.evaluation).toBeNull();
    // A filled field that is wrong is still refused, naming it.
    const wrong = await save(partial.body, {
      inputs: { ...partial.body.inputs, shoeWidth: { value: -3, unit: 'mm' } },
    });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields.map((f: { path: string }) => f.path)).toContain(
      'inputs.shoeWidth',
    );

    const refused = await trySubmit(partial.body);
    expect(refused.status).toBe(400);
    const paths = refused.body.error.fields.map((f: { path: string }) => f.path);
    expect(paths.length).toBeGreaterThan(0);
  });

  it('the example duty marks every value; submit lists them until each is confirmed or changed', async () => {
    const rev = await create({ kind: 'example' });
    expect(rev.unconfirmed.length).toBe(Object.keys(rev.inputs).length);
    const refused = await trySubmit(rev);
    expect(refused.status).toBe(400);
    expect(refused.body.error.fields).toContainEqual({
      path: 'inputs.drumDiameter',
      message: 'not confirmed: Brake drum diameter',
    });

    // Changing a value confirms it; the client cannot add keys back to the list.
    const changed = await save(rev, {
      inputs: { ...rev.inputs, drumDiameter: { value: 500, unit: 'mm' } },
      unconfirmed: [...rev.unconfirmed, 'notAField'],
    });
    expect(changed.status, changed.text).toBe(200);
    expect(changed.body.unconfirmed).not.toContain('drumDiameter');
    expect(changed.body.unconfirmed).not.toContain('notAField');
    expect(changed.body.unconfirmed.length).toBe(rev.unconfirmed.length - 1);
    // Saving without the list keeps the rest marked.
    const kept = await save(changed.body, { inputs: changed.body.inputs });
    expect(kept.body.unconfirmed.length).toBe(changed.body.unconfirmed.length);

    // Confirming the rest without changing them lets it go to check.
    const confirmed = await save(kept.body, { inputs: kept.body.inputs, unconfirmed: [] });
    expect(confirmed.body.unconfirmed).toEqual([]);
    const sent = await trySubmit(confirmed.body);
    expect(sent.status, sent.text).toBe(200);

    // The trail keeps the confirmation as its own entry, by whom and how many; the changed value
    // was an entry, not a confirmation, and a save that confirms nothing adds none.
    const trail = await ctx.request('GET', `/api/sheets/${rev.sheetId}/audit`, { as: 'checker' });
    expect(trail.status, trail.text).toBe(200);
    const confirmations = trail.body.items.filter(
      (e: { action: string }) => e.action === 'revision.values-confirmed',
    );
    expect(confirmations).toHaveLength(1);
    expect(confirmations[0].after.count).toBe(rev.unconfirmed.length - 1);
    expect(confirmations[0].after.confirmed).not.toContain('drumDiameter');
    expect(confirmations[0].actor.id).toBe(await ctx.userId('engineer'));
  });

  it('copies an approved revision of the same type, every value marked; refuses drafts', async () => {
    const source = await create({ kind: 'example' }, 'Twin brake');
    const ready = await save(source, { inputs: source.inputs, unconfirmed: [] });
    await submit(ctx, ready.body.id);
    const refused = await ctx.request('POST', '/api/sheets', {
      as: 'engineer',
      body: {
        title: 'Copy too early',
        positionId: reg.positionId,
        sheetType: 'hoist-shoe-brake',
        start: { kind: 'copy', revisionId: source.id },
      },
    });
    expect(refused.status).toBe(400);
    expect(refused.body.error.fields[0].path).toBe('start.revisionId');
    await approve(ctx, source.id);

    const copy = await create({ kind: 'copy', revisionId: source.id }, 'Copy of the twin');
    expect(copy.inputs).toEqual(source.inputs);
    expect(copy.unconfirmed.length).toBe(Object.keys(source.inputs).length);
    const wrongType = await ctx.request('POST', '/api/sheets', {
      as: 'engineer',
      body: {
        title: 'Wrong type',
        positionId: reg.positionId,
        sheetType: 'travel-shoe-brake',
        start: { kind: 'copy', revisionId: source.id },
      },
    });
    expect(wrongType.status).toBe(400);
  });

  it('without a start, the example duty is used with every value marked, and submit refuses', async () => {
    const rev = await create(undefined);
    expect(rev.unconfirmed.length).toBe(Object.keys(rev.inputs).length);
    expect(rev.evaluation).not.toBeNull();
    const refused = await ctx.request('POST', `/api/revisions/${rev.id}/submit`, {
      as: 'engineer',
      body: { rowVersion: rev.rowVersion, justification: 'Example duty.' },
    });
    expect(refused.status).toBe(400);
    expect(refused.body.error.fields.length).toBe(rev.unconfirmed.length);
  });

  it('takes the criteria set of the drive the brake is on, unless the engineer names one', async () => {
    const conveyor = await ctx.request('POST', '/api/register/positions', {
      as: 'engineer',
      body: { machineId: reg.machineId, tag: 'CV-B1', description: 'Conveyor', motion: 'conveyor' },
    });
    expect(conveyor.status, conveyor.text).toBe(201);
    const setOf = async (positionId: string, sheetType: string, criteriaSetId?: string) => {
      const res = await ctx.request('POST', '/api/sheets', {
        as: 'engineer',
        body: { title: 'Drive brake', positionId, sheetType, criteriaSetId },
      });
      expect(res.status, res.text).toBe(201);
      return res.body.criteriaSetId as string;
    };
    // A caliper fits any drive: on a hoist (the register's MH-B1) the hoist set, on a conveyor
    // the general one. A shoe-brake type says its drive itself, wherever it is placed.
    expect(await setOf(reg.positionId, 'caliper-disc-brake')).toBe('crane-hoist');
    expect(await setOf(conveyor.body.id, 'caliper-disc-brake')).toBe('general-industry');
    expect(await setOf(conveyor.body.id, 'hoist-shoe-brake')).toBe('crane-hoist');
    expect(await setOf(reg.positionId, 'travel-shoe-brake')).toBe('travel-drive');
    expect(await setOf(reg.positionId, 'caliper-disc-brake', 'general-industry')).toBe(
      'general-industry',
    );
  });
});
