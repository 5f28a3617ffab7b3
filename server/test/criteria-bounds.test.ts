import { sql } from 'kysely';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { CriterionValue } from '@holdfast/calc';
import {
  createSheet,
  createSheetsContext,
  getRevision,
  makeRegister,
  type SheetsContext,
} from './sheets-fixture.js';

describe('criteria values an engineer can stand behind', () => {
  let ctx: SheetsContext;
  beforeAll(async () => {
    ctx = await createSheetsContext();
  });
  beforeEach(() => ctx.resetAll());
  afterAll(() => ctx?.closeAll());

  async function values(id: string): Promise<CriterionValue[]> {
    const res = await ctx.request('GET', `/api/criteria-sets/${id}`, { as: 'admin' });
    expect(res.status, res.text).toBe(200);
    return res.body.values;
  }
  const publish = (id: string, vals: CriterionValue[]) =>
    ctx.request('POST', `/api/criteria-sets/${id}/versions`, {
      as: 'admin',
      body: { values: vals, note: 'Trying a value.' },
    });

  it('refuses 1e308, −5 and 0 with the field path (400), and publishes nothing', async () => {
    const vals = await values('crane-hoist');
    const i = vals.findIndex((v) => v.key === 'pvLimit');
    for (const bad of [1e308, -5, 0]) {
      const res = await publish(
        'crane-hoist',
        vals.map((v, j) => (j === i ? { ...v, value: bad } : v)),
      );
      expect(res.status, String(bad)).toBe(400);
      expect(res.body.error.fields).toEqual([
        { path: `values.${i}.value`, message: expect.stringMatching(/above 0 and at most/) },
      ]);
    }
    const f = vals.findIndex((v) => v.key === 'thrusterForceRatio');
    const low = await publish(
      'crane-hoist',
      vals.map((v, j) => (j === f ? { ...v, value: 0.5 } : v)),
    );
    expect(low.status).toBe(400);
    expect(low.body.error.fields[0].path).toBe(`values.${f}.value`);
    const detail = await ctx.request('GET', '/api/criteria-sets/crane-hoist', { as: 'admin' });
    expect(detail.body.version).toBe(1);
  });

  it('refuses a wrong unit and a "from memory" standing whose source no longer says so', async () => {
    const vals = await values('crane-hoist');
    const i = vals.findIndex((v) => v.key === 'pvLimit');
    const unit = await publish(
      'crane-hoist',
      vals.map((v, j) => (j === i ? { ...v, unit: 'psi ft/min' } : v)),
    );
    expect(unit.status).toBe(400);
    expect(unit.body.error.fields[0].path).toBe(`values.${i}.unit`);
    const makers = "maker's data: lining sheet LX-2, p·v 1.8 MPa·m/s";
    const stale = await publish(
      'crane-hoist',
      vals.map((v, j) => (j === i ? { ...v, value: 1.8e6, source: makers } : v)),
    );
    expect(stale.status).toBe(400);
    expect(stale.body.error.fields[0].path).toBe(`values.${i}.confidence`);
    const ok = await publish(
      'crane-hoist',
      vals.map((v, j) =>
        j === i ? { ...v, value: 1.8e6, source: makers, confidence: 'secondary' as const } : v,
      ),
    );
    expect(ok.status, ok.text).toBe(201);
    expect(ok.body.values[i]).toMatchObject({ confidence: 'secondary', source: makers });
  });

  it('a nonsense value already in the database makes a save a 400 naming the criterion, not a 500', async () => {
    const reg = await makeRegister(ctx);
    const sheet = await createSheet(ctx, reg);
    const rev = await getRevision(ctx, sheet.revisions[0].id);
    const vals = (await values(rev.criteriaSetId)).map((v) =>
      v.key === 'pvLimit' ? { ...v, value: -5 } : v,
    );
    // Written behind the service's back, as an older release could have.
    await sql`insert into criteria_set_versions (criteria_set_id, version, values, note)
      values (${rev.criteriaSetId}, 2, ${JSON.stringify(vals)}::jsonb, 'bad')`.execute(ctx.db);
    const res = await ctx.request('PUT', `/api/revisions/${rev.id}`, {
      as: 'engineer',
      body: { inputs: rev.inputs, unitSystem: 'SI', changeNote: 'x', rowVersion: rev.rowVersion },
    });
    expect(res.status, res.text).toBe(400);
    expect(res.body.error.fields[0].path).toBe('criteria.pvLimit');
  });
});
