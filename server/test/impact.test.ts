import { sql } from 'kysely';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { CriteriaService } from '../src/criteria/criteria.service.js';
import { evaluateSheet } from '../src/calc/calc-engine.js';
import type { CriterionValue } from '@holdfast/calc';
import { stricterValues } from './criteria-fixture.js';
import {
  approve,
  createSheet,
  createSheetsContext,
  getRevision,
  makeRegister,
  submit,
  type SheetsContext,
} from './sheets-fixture.js';

describe('criteria sets, impact check and drift check', () => {
  let ctx: SheetsContext;
  beforeAll(async () => {
    ctx = await createSheetsContext();
  });
  beforeEach(() => ctx.resetAll());
  afterAll(() => ctx?.closeAll());

  it('seeds the shipped sets as version 1 and lets only admins publish new versions', async () => {
    const list = await ctx.request('GET', '/api/criteria-sets', { as: 'viewer' });
    expect(list.body.items.length).toBeGreaterThan(0);
    for (const s of list.body.items) expect(s.version).toBe(1);
    const id = list.body.items[0].id;
    const detail = await ctx.request('GET', `/api/criteria-sets/${id}`, { as: 'engineer' });
    expect(detail.body).toMatchObject({
      id,
      version: 1,
      publishedBy: null,
      versions: [{ version: 1 }],
    });
    const values = detail.body.values as CriterionValue[];
    const body = { values, note: 'Same values.' };
    expect(
      (await ctx.request('POST', `/api/criteria-sets/${id}/versions`, { as: 'checker', body }))
        .status,
    ).toBe(403);
    expect(
      (await ctx.request('POST', `/api/criteria-sets/${id}/versions`, { as: 'engineer', body }))
        .status,
    ).toBe(403);
    const missing = await ctx.request('POST', `/api/criteria-sets/${id}/versions`, {
      as: 'admin',
      body: { values: values.slice(1), note: 'x' },
    });
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields[0].message).toMatch(/missing/);
    const ok = await ctx.request('POST', `/api/criteria-sets/${id}/versions`, {
      as: 'admin',
      body,
    });
    expect(ok.status, ok.text).toBe(201);
    expect(ok.body).toMatchObject({
      version: 2,
      publishedBy: { displayName: 'Sam Ortiz' },
      note: 'Same values.',
    });
    const v1 = await ctx.request('GET', `/api/criteria-sets/${id}?version=1`, { as: 'viewer' });
    expect(v1.body.version).toBe(1);
  });

  it('lists approved sheets that would fail a new version, and none for the version they used', async () => {
    const reg = await makeRegister(ctx);
    const sheet = await createSheet(ctx, reg);
    const revId = sheet.revisions[0].id;
    await submit(ctx, revId);
    await approve(ctx, revId);
    const rev = await getRevision(ctx, revId);
    const setId = rev.criteriaSetId;
    const base = await ctx.app.get(CriteriaService).load(setId, 'latest');
    const before = await ctx.request('GET', `/api/criteria-sets/${setId}/impact`, {
      as: 'checker',
    });
    expect(before.status).toBe(200);
    const failingNow = rev.evaluation.pass ? 0 : 1;
    expect(before.body.items).toHaveLength(failingNow);
    expect(before.body.checked).toBe(1);
    // A version whose values make the stored inputs fail, inside every criterion's bounds.
    const stricter = stricterValues(base.values);
    const chosen = evaluateSheet(rev.sheetType, rev.inputs, { ...base, values: stricter }).pass
      ? undefined
      : stricter;
    expect(chosen).toBeDefined();
    const pub = await ctx.request('POST', `/api/criteria-sets/${setId}/versions`, {
      as: 'admin',
      body: { values: chosen, note: 'Stricter (test).' },
    });
    expect(pub.status, pub.text).toBe(201);
    const impact = await ctx.request('GET', `/api/criteria-sets/${setId}/impact?version=2`, {
      as: 'admin',
    });
    expect(impact.body.items).toHaveLength(1);
    expect(impact.body.items[0]).toMatchObject({
      sheetId: sheet.id,
      revisionId: revId,
      revisionLabel: 'A',
      documentNumber: sheet.documentNumber,
    });
    expect(impact.body.items[0].failing.length).toBeGreaterThan(0);
    const v1 = await ctx.request('GET', `/api/criteria-sets/${setId}/impact?version=1`, {
      as: 'admin',
    });
    expect(v1.body.items).toHaveLength(failingNow);
    expect(
      (await ctx.request('GET', `/api/criteria-sets/${setId}/impact`, { as: 'engineer' })).status,
    ).toBe(403);
  });
});

describe('drift check', () => {
  let ctx: SheetsContext;
  beforeAll(async () => {
    ctx = await createSheetsContext();
    await ctx.resetAll();
  });
  afterAll(() => ctx?.closeAll());

  it('reports nothing for an approved revision under the same core', async () => {
    const reg = await makeRegister(ctx);
    const sheet = await createSheet(ctx, reg);
    const id = sheet.revisions[0].id;
    await submit(ctx, id);
    await approve(ctx, id);
    const drift = await ctx.request('POST', `/api/revisions/${id}/drift`, { as: 'viewer' });
    expect(drift.status, drift.text).toBe(200);
    expect(drift.body).toMatchObject({ moved: [], checksChanged: [], error: null });
    expect(drift.body.coreVersionNow).toBe(drift.body.coreVersionThen);
  });

  it('reports results that moved beyond 1e-9 relative, and only those', async () => {
    const reg = await makeRegister(ctx, 'DRF');
    const sheet = await createSheet(ctx, reg);
    const id = sheet.revisions[0].id;
    const rev = await getRevision(ctx, id);
    // Stand in for an older core: shift the stored (draft, still mutable) evaluation.
    const results = rev.evaluation.results.map((r: { value: number }, i: number) => ({
      ...r,
      value: i === 0 ? r.value * 1.01 : i === 1 ? r.value * (1 + 1e-12) : r.value,
    }));
    const old = { ...rev.evaluation, results, coreVersion: '0.9.0' };
    await sql`update revisions set evaluation = ${JSON.stringify(old)}::jsonb, core_version = '0.9.0' where id = ${id}`.execute(
      ctx.db,
    );
    const drift = await ctx.request('POST', `/api/revisions/${id}/drift`, { as: 'engineer' });
    expect(drift.status, drift.text).toBe(200);
    expect(drift.body.coreVersionThen).toBe('0.9.0');
    expect(drift.body.moved.map((m: { key: string }) => m.key)).toEqual([
      rev.evaluation.results[0].key,
    ]);
    const m = drift.body.moved[0];
    expect(Math.abs(m.now - rev.evaluation.results[0].value)).toBeLessThanOrEqual(
      1e-9 * Math.abs(m.now),
    );
    expect(Math.abs(m.delta - (m.now - m.then))).toBeLessThanOrEqual(1e-9 * Math.abs(m.then));
  });
});
