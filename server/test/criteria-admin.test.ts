import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { CriterionValue } from '@holdfast/calc';
import { ensurePoppler, inspectPdf } from '@holdfast/print/testing';
import {
  approve,
  createSheet,
  createSheetsContext,
  makeRegister,
  submit,
  type SheetsContext,
} from './sheets-fixture.js';

const MAKERS = "maker's data: lining data sheet LX-2 (invented for the test), Table 3";

describe('criteria sets admins create, and values confirmed against documents', () => {
  let ctx: SheetsContext;
  beforeAll(async () => {
    ctx = await createSheetsContext();
  });
  beforeEach(() => ctx.resetAll());
  afterAll(() => ctx?.closeAll());

  async function values(id: string, version?: number): Promise<CriterionValue[]> {
    const q = version ? `?version=${version}` : '';
    return (await ctx.request('GET', `/api/criteria-sets/${id}${q}`, { as: 'admin' })).body.values;
  }

  it('lets an admin create the plant’s own set with the source of each value', async () => {
    const base = (await values('crane-hoist')).map((v) =>
      v.key === 'pvLimit'
        ? { ...v, value: 1.8e6, source: MAKERS, confidence: 'secondary' as const }
        : v,
    );
    const body = {
      id: 'plant-standard',
      name: 'Plant standard PS-7 (invented)',
      description: 'The plant’s own limits for hoist brakes; the governing standard decides.',
      values: base,
      note: 'From the plant standard and the lining maker’s data.',
    };
    expect((await ctx.request('POST', '/api/criteria-sets', { as: 'engineer', body })).status).toBe(
      403,
    );
    const missing = await ctx.request('POST', '/api/criteria-sets', {
      as: 'admin',
      body: { ...body, values: base.filter((v) => v.key !== 'adhesionLimit') },
    });
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields).toEqual([
      { path: 'values', message: 'value "adhesionLimit" is missing' },
    ]);
    const i = base.findIndex((v) => v.key === 'thrusterForceRatio');
    const bad = await ctx.request('POST', '/api/criteria-sets', {
      as: 'admin',
      body: { ...body, values: base.map((v, j) => (j === i ? { ...v, value: 0 } : v)) },
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields[0].path).toBe(`values.${i}.value`);
    const ok = await ctx.request('POST', '/api/criteria-sets', { as: 'admin', body });
    expect(ok.status, ok.text).toBe(201);
    expect(ok.body).toMatchObject({
      id: 'plant-standard',
      version: 1,
      publishedBy: { displayName: 'Sam Ortiz' },
      confirmations: [],
    });
    expect(ok.body.values.find((v: CriterionValue) => v.key === 'pvLimit')).toMatchObject({
      value: 1.8e6,
      source: MAKERS,
      confidence: 'secondary',
    });
    const list = await ctx.request('GET', '/api/criteria-sets', { as: 'viewer' });
    expect(list.body.items.map((s: { id: string }) => s.id)).toContain('plant-standard');
    expect((await ctx.request('POST', '/api/criteria-sets', { as: 'admin', body })).status).toBe(
      409,
    );
  });

  it('confirms a value against a document: who, when, which document and clause; it holds while the value stays', async () => {
    const url = '/api/criteria-sets/crane-hoist/versions/1/confirmations';
    const body = { key: 'pvLimit', document: 'Lining data sheet LX-2 rev. 4', clause: 'Table 3' };
    expect((await ctx.request('POST', url, { as: 'engineer', body })).status).toBe(403);
    const unknown = await ctx.request('POST', url, {
      as: 'checker',
      body: { ...body, key: 'nothing' },
    });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.fields[0].path).toBe('key');
    const blank = await ctx.request('POST', url, { as: 'checker', body: { ...body, clause: ' ' } });
    expect(blank.status).toBe(400);
    expect(blank.body.error.fields[0].path).toBe('clause');
    const ok = await ctx.request('POST', url, { as: 'checker', body });
    expect(ok.status, ok.text).toBe(201);
    expect(ok.body.confirmations).toEqual([
      expect.objectContaining({
        key: 'pvLimit',
        version: 1,
        document: body.document,
        clause: 'Table 3',
        confirmedBy: expect.objectContaining({ id: await ctx.userId('checker') }),
      }),
    ]);
    // Same value in version 2: still confirmed. A changed value in version 3: not any more.
    const v1 = await values('crane-hoist');
    const publish = (vals: CriterionValue[]) =>
      ctx.request('POST', '/api/criteria-sets/crane-hoist/versions', {
        as: 'admin',
        body: { values: vals, note: 'Test.' },
      });
    expect((await publish(v1)).body.confirmations).toHaveLength(1);
    const v3 = await publish(v1.map((v) => (v.key === 'pvLimit' ? { ...v, value: 2e6 } : v)));
    expect(v3.status, v3.text).toBe(201);
    expect(v3.body.confirmations).toEqual([]);
  });

  it('prints a from-memory value with a mark beside it, and the confirming document once confirmed', async () => {
    ensurePoppler();
    const reg = await makeRegister(ctx);
    const sheet = await createSheet(ctx, reg);
    const id = sheet.revisions[0].id;
    await submit(ctx, id);
    await approve(ctx, id);
    const print = async (name: string) => {
      const res = await fetch(`${ctx.baseUrl}/api/revisions/${id}/pdf`, {
        headers: { authorization: `Bearer ${await ctx.token('viewer')}` },
      });
      expect(res.status).toBe(200);
      return inspectPdf(Buffer.from(await res.arrayBuffer()), name)
        .rawPageText.join(' ')
        .replace(/\s+/g, ' ');
    };
    const count = (text: string) => text.split('[from memory]').length - 1;
    const before = await print('criteria-from-memory');
    expect(count(before)).toBeGreaterThan(0);
    const res = await ctx.request(
      'POST',
      '/api/criteria-sets/crane-hoist/versions/1/confirmations',
      {
        as: 'checker',
        body: { key: 'pvLimit', document: 'Lining data sheet LX-2 rev. 4', clause: 'Table 3' },
      },
    );
    expect(res.status, res.text).toBe(201);
    const after = await print('criteria-confirmed');
    expect(after).toContain('confirmed: Lining data sheet LX-2 rev. 4, Table 3');
    expect(count(after)).toBe(count(before) - 1);
  }, 120_000);
});
