import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { SheetEvaluation } from '@holdfast/calc';
import { evaluateSheet, settingBandsOf, sheetTypeDefinition } from '../src/calc/calc-engine.js';
import { CriteriaService } from '../src/criteria/criteria.service.js';
import { stricterValues } from './criteria-fixture.js';
import {
  approve,
  createSheet,
  createSheetsContext,
  getRevision,
  makeRegister,
  submit,
  type Register,
  type SheetsContext,
} from './sheets-fixture.js';

/**
 * Make a draft's checks fail with test-only data: first by scaling one quantity input within its
 * bounds, else by publishing a stricter criteria version. Returns how.
 */
async function makeFailing(ctx: SheetsContext, rev: any): Promise<void> {
  const base = await ctx.app.get(CriteriaService).load(rev.criteriaSetId, 'latest');
  const def = sheetTypeDefinition(rev.sheetType);
  for (const field of def.fields.filter((f) => f.kind === 'quantity')) {
    for (const f of [0.2, 5, 0.05, 20]) {
      const q = rev.inputs[field.key];
      if (typeof q !== 'object' || q === null) continue;
      const inputs = { ...rev.inputs, [field.key]: { ...q, value: q.value * f } };
      try {
        if (evaluateSheet(rev.sheetType, inputs, base).pass) continue;
      } catch {
        continue;
      }
      const res = await ctx.request('PUT', `/api/revisions/${rev.id}`, {
        as: 'engineer',
        body: {
          inputs,
          unitSystem: 'SI',
          changeNote: 'Failing on purpose.',
          rowVersion: rev.rowVersion,
        },
      });
      expect(res.status, res.text).toBe(200);
      return;
    }
  }
  // Else a stricter criteria version, inside every criterion's bounds.
  const values = stricterValues(base.values);
  if (!evaluateSheet(rev.sheetType, rev.inputs, { ...base, values }).pass) {
    const res = await ctx.request('POST', `/api/criteria-sets/${rev.criteriaSetId}/versions`, {
      as: 'admin',
      body: { values, note: 'Test: stricter values.' },
    });
    expect(res.status, res.text).toBe(201);
    return;
  }
  throw new Error('could not make the default inputs fail');
}

describe('revisions: server-side evaluation, validation, justification, audit', () => {
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

  it('ignores client results: extra fields are refused and submit recomputes on the server', async () => {
    const sheet = await createSheet(ctx, reg);
    const rev = await getRevision(ctx, sheet.revisions[0].id);
    const forged = { ...rev.evaluation, pass: true, results: [] };
    const tampered = await ctx.request('PUT', `/api/revisions/${rev.id}`, {
      as: 'engineer',
      body: {
        inputs: rev.inputs,
        unitSystem: 'SI',
        changeNote: 'x',
        rowVersion: rev.rowVersion,
        evaluation: forged,
      },
    });
    expect(tampered.status).toBe(400);
    const tamperedSubmit = await ctx.request('POST', `/api/revisions/${rev.id}/submit`, {
      as: 'engineer',
      body: { rowVersion: rev.rowVersion, justification: 'x', evaluation: forged },
    });
    expect(tamperedSubmit.status).toBe(400);
    expect((await getRevision(ctx, rev.id)).state).toBe('draft');

    const submitted = await submit(ctx, rev.id);
    const criteria = await ctx.app
      .get(CriteriaService)
      .load(submitted.criteriaSetId, submitted.criteriaSetVersion);
    const expected: SheetEvaluation = evaluateSheet(
      submitted.sheetType,
      submitted.inputs,
      criteria,
    );
    expect(submitted.evaluation.results.length).toBe(expected.results.length);
    for (const r of expected.results) {
      const got = submitted.evaluation.results.find((x: { key: string }) => x.key === r.key);
      expect(Math.abs(got.value - r.value)).toBeLessThanOrEqual(
        1e-9 * Math.max(1, Math.abs(r.value)),
      );
    }
    expect(submitted.evaluation.pass).toBe(expected.pass);
    // The setting table goes to the record checked row by row, with the band around the set value.
    expect(submitted.evaluation.settingBands).toEqual(
      settingBandsOf(submitted.sheetType, submitted.inputs, criteria, expected),
    );
    const [band] = submitted.evaluation.settingBands;
    const table = submitted.evaluation.tables.find((t: { id: string }) => t.id === band.tableId);
    expect(band.failing).toHaveLength(table.rows.length);
    expect(band.low).toBeLessThanOrEqual(band.set);
    expect(band.high).toBeGreaterThanOrEqual(band.set);
  });

  it('answers bad input with 400 naming inputs.<field> and keeps the stored draft', async () => {
    const sheet = await createSheet(ctx, reg);
    const rev = await getRevision(ctx, sheet.revisions[0].id);
    const def = sheetTypeDefinition(rev.sheetType);
    const field = def.fields.find(
      (f) => f.kind === 'quantity' && f.min !== undefined && f.min >= 0,
    )!;
    const current = rev.inputs[field.key];
    const broken = typeof current === 'object' ? { ...current, value: -1e9 } : -1e9;
    const res = await ctx.request('PUT', `/api/revisions/${rev.id}`, {
      as: 'engineer',
      body: {
        inputs: { ...rev.inputs, [field.key]: broken },
        unitSystem: 'SI',
        changeNote: 'x',
        rowVersion: rev.rowVersion,
      },
    });
    expect(res.status, res.text).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.fields.map((f: { path: string }) => f.path)).toContain(
      `inputs.${field.key}`,
    );
    const after = await getRevision(ctx, rev.id);
    expect(after.rowVersion).toBe(rev.rowVersion);
    expect(after.inputs).toEqual(rev.inputs);
  });

  it('needs a written justification when checks fail, and keeps it', async () => {
    const sheet = await createSheet(ctx, reg);
    await makeFailing(ctx, await getRevision(ctx, sheet.revisions[0].id));
    const rev = await getRevision(ctx, sheet.revisions[0].id);
    const without = await ctx.request('POST', `/api/revisions/${rev.id}/submit`, {
      as: 'engineer',
      body: { rowVersion: rev.rowVersion },
    });
    expect(without.status, without.text).toBe(400);
    expect(without.body.error.fields[0].path).toBe('justification');
    const withIt = await ctx.request('POST', `/api/revisions/${rev.id}/submit`, {
      as: 'engineer',
      body: {
        rowVersion: rev.rowVersion,
        justification: 'Temporary duty; maker confirms margin in writing.',
      },
    });
    expect(withIt.status, withIt.text).toBe(200);
    expect(withIt.body).toMatchObject({
      state: 'in_check',
      justification: 'Temporary duty; maker confirms margin in writing.',
    });
    expect(withIt.body.evaluation.pass).toBe(false);
  });

  it('approves a revision with failing checks only when the checker says why, naming the checks', async () => {
    const sheet = await createSheet(ctx, reg);
    await makeFailing(ctx, await getRevision(ctx, sheet.revisions[0].id));
    const id = sheet.revisions[0].id;
    await submit(ctx, id);
    const rev = await getRevision(ctx, id, 'checker');
    const failing = rev.evaluation.checks.filter((c: { pass: boolean }) => !c.pass);
    expect(failing.length).toBeGreaterThan(0);
    const bare = await ctx.request('POST', `/api/revisions/${id}/approve`, {
      as: 'checker',
      body: { rowVersion: rev.rowVersion, note: '   ' },
    });
    expect(bare.status, bare.text).toBe(400);
    expect(bare.body.error.fields[0]).toMatchObject({ path: 'note' });
    expect(bare.body.error.fields[0].message).toContain(failing[0].label);
    expect((await getRevision(ctx, id, 'checker')).state).toBe('in_check');
    const approved = await approve(ctx, id, 'checker', 'Maker confirms the margin in writing.');
    expect(approved).toMatchObject({
      state: 'approved',
      approvalNote: 'Maker confirms the margin in writing.',
    });
  });

  it('approves with a comment open only when the checker says why; a resolved comment asks nothing', async () => {
    const sheet = await createSheet(ctx, reg);
    const id = sheet.revisions[0].id;
    await submit(ctx, id);
    const posted = await ctx.request('POST', `/api/revisions/${id}/comments`, {
      as: 'checker',
      body: { body: 'Where does the lining width come from?' },
    });
    expect(posted.status, posted.text).toBe(201);
    const rev = await getRevision(ctx, id, 'checker');
    const bare = await ctx.request('POST', `/api/revisions/${id}/approve`, {
      as: 'checker',
      body: { rowVersion: rev.rowVersion },
    });
    expect(bare.status, bare.text).toBe(400);
    expect(bare.body.error.fields[0]).toMatchObject({ path: 'note' });
    expect(bare.body.error.fields[0].message).toMatch(/one comment is still open/);
    expect((await getRevision(ctx, id, 'checker')).state).toBe('in_check');
    // Resolved, the comment asks for nothing more.
    const resolved = await ctx.request('PATCH', `/api/comments/${posted.body.id}`, {
      as: 'checker',
      body: { resolved: true },
    });
    expect(resolved.status, resolved.text).toBe(200);
    const approved = await approve(ctx, id);
    expect(approved.state).toBe('approved');
  });

  it('records an audit event for every save and state change, with who and before/after', async () => {
    // The one save below also confirms the example values, so the trail has one save and one
    // confirmation entry right after it.
    const sheet = await createSheet(ctx, reg, { confirm: false });
    const id = sheet.revisions[0].id;
    const rev = await getRevision(ctx, id);
    await ctx.request('PUT', `/api/revisions/${id}`, {
      as: 'engineer',
      body: {
        inputs: rev.inputs,
        unitSystem: 'US',
        changeNote: 'Units.',
        unconfirmed: [],
        rowVersion: rev.rowVersion,
      },
    });
    await submit(ctx, id);
    const checking = await getRevision(ctx, id, 'checker');
    await ctx.request('POST', `/api/revisions/${id}/return`, {
      as: 'checker',
      body: { rowVersion: checking.rowVersion, comment: 'Fix.' },
    });
    await submit(ctx, id);
    // The return's reason is still an open comment: the approval says why it stands.
    await approve(ctx, id, 'checker2', 'Fixed as asked in the return.');
    const audit = await ctx.request('GET', `/api/sheets/${sheet.id}/audit`, { as: 'engineer' });
    expect(audit.status).toBe(200);
    const forViewer = await ctx.request('GET', `/api/sheets/${sheet.id}/audit`, { as: 'viewer' });
    expect(forViewer.status).toBe(200);
    const viewerItems = forViewer.body.items as { before: any; after: any }[];
    expect(viewerItems[1].after.inputs).toBeUndefined();
    expect(viewerItems[1].after.unitSystem).toBeUndefined();
    expect(viewerItems[6].after.state).toBe('approved');
    expect(viewerItems[2].after.confirmed).toBeUndefined();
    const items = audit.body.items as {
      action: string;
      actor: { displayName: string };
      before: any;
      after: any;
    }[];
    expect(items.map((i) => i.action)).toEqual([
      'sheet.created',
      'revision.saved',
      'revision.values-confirmed',
      'revision.submitted',
      'revision.returned',
      'revision.submitted',
      'revision.approved',
    ]);
    expect(items.map((i) => i.actor.displayName)).toEqual([
      'Erin Vale',
      'Erin Vale',
      'Erin Vale',
      'Erin Vale',
      'Mara Lind',
      'Erin Vale',
      'Idris Okafor',
    ]);
    expect(items[1].before.unitSystem).toBe('SI');
    expect(items[1].after.unitSystem).toBe('US');
    expect(items[2].after.count).toBe(Object.keys(rev.inputs).length);
    expect(items[6].before.state).toBe('in_check');
    expect(items[6].after.state).toBe('approved');
  });

  it('compares two revisions: changed inputs with units, moved results and checks', async () => {
    const sheet = await createSheet(ctx, reg);
    const a = await getRevision(ctx, sheet.revisions[0].id);
    await submit(ctx, a.id);
    await approve(ctx, a.id);
    const b = (
      await ctx.request('POST', `/api/sheets/${sheet.id}/revisions`, {
        as: 'engineer',
        body: { changeNote: 'Bigger.' },
      })
    ).body;
    const def = sheetTypeDefinition(b.sheetType);
    // Raise a quantity input by 5 % (within range) and see results move.
    const field = def.fields.find(
      (f) =>
        f.kind === 'quantity' && typeof b.inputs[f.key] === 'object' && b.inputs[f.key].value > 0,
    )!;
    const changed = { ...b.inputs[field.key], value: b.inputs[field.key].value * 1.05 };
    const saved = await ctx.request('PUT', `/api/revisions/${b.id}`, {
      as: 'engineer',
      body: {
        inputs: { ...b.inputs, [field.key]: changed },
        unitSystem: 'SI',
        changeNote: 'Bigger.',
        rowVersion: b.rowVersion,
      },
    });
    expect(saved.status, saved.text).toBe(200);
    const cmp = await ctx.request(
      'GET',
      `/api/sheets/${sheet.id}/compare?from=${a.id}&to=${b.id}`,
      { as: 'engineer' },
    );
    expect(cmp.status, cmp.text).toBe(200);
    expect(cmp.body.from.label).toBe('A');
    expect(cmp.body.to.label).toBe('B');
    expect(cmp.body.inputs).toEqual([
      { key: field.key, label: field.label, from: a.inputs[field.key], to: changed },
    ]);
    expect(cmp.body.results.length).toBeGreaterThan(0);
    for (const r of cmp.body.results) {
      if (r.from !== null && r.to !== null) {
        expect(Math.abs(r.delta - (r.to - r.from))).toBeLessThanOrEqual(
          1e-9 * Math.max(1, Math.abs(r.to)),
        );
      }
    }
    const self = await ctx.request(
      'GET',
      `/api/sheets/${sheet.id}/compare?from=${a.id}&to=${a.id}`,
      { as: 'viewer' },
    );
    expect(self.body).toMatchObject({ inputs: [], results: [], checks: [] });
    const other = await createSheet(ctx, reg, { title: 'Other' });
    const wrong = await ctx.request(
      'GET',
      `/api/sheets/${sheet.id}/compare?from=${a.id}&to=${other.revisions[0].id}`,
      { as: 'engineer' },
    );
    expect(wrong.status).toBe(404);
  });
});
