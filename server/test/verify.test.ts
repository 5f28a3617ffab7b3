import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  approve,
  createSheet,
  createSheetsContext,
  makeRegister,
  submit,
  type SheetsContext,
} from './sheets-fixture.js';

describe('printout verification', () => {
  let ctx: SheetsContext;
  beforeAll(async () => {
    ctx = await createSheetsContext({ VERIFY_RATE_LIMIT: '8' });
    await ctx.resetAll();
  });
  afterAll(() => ctx?.closeAll());

  it('says whether a code is the approved revision in force, reveals nothing else, and is rate limited', async () => {
    const reg = await makeRegister(ctx);
    const sheet = await createSheet(ctx, reg);
    const a = await submit(ctx, sheet.revisions[0].id);
    await approve(ctx, a.id);
    let res = await ctx.request('GET', `/api/verify/${a.verificationCode}`);
    expect(res.status, res.text).toBe(200);
    expect(Object.keys(res.body).sort()).toEqual(
      [
        'approvedAt',
        'current',
        'documentNumber',
        'newerApproved',
        'revisionLabel',
        'state',
        'title',
        'underReview',
      ].sort(),
    );
    expect(res.body).toMatchObject({
      documentNumber: sheet.documentNumber,
      revisionLabel: 'A',
      state: 'approved',
      current: true,
      newerApproved: null,
    });

    const b = await ctx.request('POST', `/api/sheets/${sheet.id}/revisions`, {
      as: 'engineer',
      body: { changeNote: 'B.' },
    });
    await submit(ctx, b.body.id);
    await approve(ctx, b.body.id);
    res = await ctx.request('GET', `/api/verify/${a.verificationCode.toLowerCase()}`);
    expect(res.body).toMatchObject({
      revisionLabel: 'A',
      state: 'superseded',
      current: false,
      newerApproved: { revisionLabel: 'B' },
    });

    // Typed as a reader might: digits for the look-alike letters, split with a hyphen.
    const typed = a.verificationCode.replace(/O/g, '0').replace(/I/g, '1').replace(/B/g, '8');
    res = await ctx.request('GET', `/api/verify/${typed.slice(0, 5)}-${typed.slice(5)}`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ revisionLabel: 'A' });

    expect((await ctx.request('GET', '/api/verify/AAAAAAAAAA')).status).toBe(404);
    const malformed = await ctx.request('GET', '/api/verify/not-a-code');
    expect(malformed.status).toBe(400);
    let limited = 0;
    for (let i = 0; i < 10; i += 1)
      if ((await ctx.request('GET', '/api/verify/AAAAAAAAAA')).status === 429) limited += 1;
    expect(limited).toBeGreaterThan(0);
  });
});
