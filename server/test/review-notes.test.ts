import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import {
  createSheet,
  createSheetsContext,
  getRevision,
  makeRegister,
  submit,
  type Register,
  type SheetsContext,
} from './sheets-fixture.js';
import { ensurePoppler, inspectPdf } from '@holdfast/print/testing';

type Quantity = { value: number; unit: string };

describe('notes and changes the checker reads', () => {
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

  /** Change one quantity input of a draft (the first one found) and save. */
  async function bumpFirstQuantity(id: string) {
    const rev = await getRevision(ctx, id);
    const key = Object.keys(rev.inputs).find(
      (k) => typeof rev.inputs[k] === 'object' && rev.inputs[k] !== null,
    )!;
    const q = rev.inputs[key] as Quantity;
    const res = await ctx.request('PUT', `/api/revisions/${id}`, {
      as: 'engineer',
      body: {
        inputs: { ...rev.inputs, [key]: { ...q, value: q.value * 1.1 } },
        unitSystem: rev.unitSystem,
        changeNote: 'Answered the checker.',
        rowVersion: rev.rowVersion,
      },
    });
    expect(res.status, res.text).toBe(200);
    return { key, from: q, to: { ...q, value: q.value * 1.1 } };
  }

  it('changes: nothing before a first submission, then what moved since the returned one', async () => {
    const sheet = await createSheet(ctx, reg);
    const id = sheet.revisions[0].id;
    const first = await ctx.request('GET', `/api/revisions/${id}/changes`, { as: 'engineer' });
    expect(first.status, first.text).toBe(200);
    expect(first.body).toEqual({ since: null, inputs: [], changeNote: null });

    const submitted = await submit(ctx, id);
    const returned = await ctx.request('POST', `/api/revisions/${id}/return`, {
      as: 'checker',
      body: { rowVersion: submitted.rowVersion, comment: 'Check the drum size.' },
    });
    expect(returned.status, returned.text).toBe(200);
    const bumped = await bumpFirstQuantity(id);
    await submit(ctx, id);

    const res = await ctx.request('GET', `/api/revisions/${id}/changes`, { as: 'checker' });
    expect(res.status, res.text).toBe(200);
    expect(res.body.since).toMatchObject({ kind: 'submission', label: 'A' });
    expect(res.body.inputs).toHaveLength(1);
    expect(res.body.inputs[0]).toMatchObject({ key: bumped.key, from: bumped.from });
    expect((res.body.inputs[0].to as Quantity).value).toBeCloseTo(bumped.to.value, 9);
    expect(res.body.changeNote).toEqual({ from: 'First issue.', to: 'Answered the checker.' });
  });

  it('changes: a new revision is compared with the approved one; viewers may not read a draft', async () => {
    const sheet = await createSheet(ctx, reg);
    const a = sheet.revisions[0].id;
    const sub = await submit(ctx, a);
    const ok = await ctx.request('POST', `/api/revisions/${a}/approve`, {
      as: 'checker',
      body: { rowVersion: sub.rowVersion, note: 'Margins confirmed against the maker data.' },
    });
    expect(ok.status, ok.text).toBe(200);
    expect(ok.body.approvalNote).toBe('Margins confirmed against the maker data.');

    const b = await ctx.request('POST', `/api/sheets/${sheet.id}/revisions`, {
      as: 'engineer',
      body: { changeNote: 'Heavier ladle.' },
    });
    expect(b.status, b.text).toBe(201);
    const bumped = await bumpFirstQuantity(b.body.id);
    const res = await ctx.request('GET', `/api/revisions/${b.body.id}/changes`, { as: 'checker' });
    expect(res.status, res.text).toBe(200);
    expect(res.body.since).toMatchObject({ kind: 'revision', label: 'A' });
    expect(res.body.inputs.map((i: { key: string }) => i.key)).toEqual([bumped.key]);
    expect(res.body.changeNote).toBeNull();

    const viewer = await ctx.request('GET', `/api/revisions/${b.body.id}/changes`, {
      as: 'viewer',
    });
    expect(viewer.status).toBe(403);
    const anon = await ctx.request('GET', `/api/revisions/${b.body.id}/changes`);
    expect(anon.status).toBe(401);
  });

  it('prints the approval note in the approvals table', async () => {
    const sheet = await createSheet(ctx, reg);
    const a = sheet.revisions[0].id;
    const sub = await submit(ctx, a);
    await ctx.request('POST', `/api/revisions/${a}/approve`, {
      as: 'checker',
      body: { rowVersion: sub.rowVersion, note: 'Fitted values witnessed on site.' },
    });
    const rev = await getRevision(ctx, a, 'viewer');
    expect(rev.approvalNote).toBe('Fitted values witnessed on site.');
    ensurePoppler();
    const res = await fetch(`${ctx.baseUrl}/api/revisions/${a}/pdf`, {
      headers: { Authorization: `Bearer ${await ctx.token('viewer')}` },
    });
    expect(res.status).toBe(200);
    const pdf = inspectPdf(Buffer.from(await res.arrayBuffer()), 'approval-note');
    const approvals = pdf.rawPageText.find((t) => t.includes('Checked and approved')) ?? '';
    expect(approvals.replace(/\s+/g, ' ')).toContain('Fitted values witnessed on site.');
  }, 120_000);
});
