import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createSheetsContext, makeRegister, type SheetsContext } from './sheets-fixture.js';

describe('sheets smoke', () => {
  let ctx: SheetsContext;
  beforeAll(async () => {
    ctx = await createSheetsContext();
    await ctx.resetAll();
  });
  afterAll(() => ctx?.closeAll());

  it('boots, lists criteria sets and an empty sheet list', async () => {
    const sets = await ctx.request('GET', '/api/criteria-sets', { as: 'viewer' });
    expect(sets.status, sets.text).toBe(200);
    expect(sets.body.items.length).toBeGreaterThan(0);
    const list = await ctx.request('GET', '/api/sheets', { as: 'viewer' });
    expect(list.status, list.text).toBe(200);
    expect(list.body).toEqual({ items: [], total: 0, page: 1, pageSize: 25 });
    await makeRegister(ctx);
    const reg = await ctx.request('GET', '/api/register', { as: 'viewer' });
    expect(reg.body.sites[0].machines[0].positions[0].tag).toBe('MH-B1');
  });
});
