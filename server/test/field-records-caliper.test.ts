import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { fieldCheckKeys } from '@holdfast/shared';
import { demoInputs, getSheetType, parseQuantity } from '@holdfast/calc';
import { ensurePoppler, inspectPdf } from '@holdfast/print/testing';
import { approve, createSheet, sheetsSuite, submit } from './sheets-fixture.js';

// Words of a drum brake that have no place where a caliper's pads and release unit are meant.
const DRUM_WORDS = /\b(shoes?|drums?|thrusters?)\b/i;

describe('field records of a caliper disc brake speak of pads, not shoes', () => {
  const suite = sheetsSuite();

  const approved = async (sheetType: string) => {
    const sheet = await createSheet(suite.ctx, suite.reg, { sheetType });
    const rev = await submit(suite.ctx, sheet.revisions[0].id);
    await approve(suite.ctx, rev.id);
    return rev.id as string;
  };
  const form = async (revisionId: string) => {
    const res = await suite.ctx.request('GET', `/api/revisions/${revisionId}/field-form`, {
      as: 'technician',
    });
    expect(res.status, res.text).toBe(200);
    return res.body as {
      checks: { key: string; label: string; minimum?: number | null }[];
      targets: { label: string }[];
    };
  };

  it('the record form labels each check item for the brake the sheet is of', async () => {
    const caliper = await form(await approved('caliper-disc-brake'));
    expect(caliper.checks.map((c) => c.key)).toEqual([...fieldCheckKeys]);
    for (const c of caliper.checks) expect(c.label).not.toMatch(DRUM_WORDS);
    for (const t of caliper.targets) expect(t.label).not.toMatch(DRUM_WORDS);
    expect(caliper.checks.map((c) => c.label)).toEqual(
      expect.arrayContaining(['No drag on pad A when released', 'Lining thickness, pad B']),
    );
    // The drum brake keeps its own words.
    const hoist = await form(await approved('hoist-shoe-brake'));
    expect(hoist.checks.map((c) => c.label)).toEqual(
      expect.arrayContaining([
        'No drag on shoe A when released',
        'Thruster condition (oil, seals, stroke free)',
      ]),
    );
  });

  it("the lining checks carry the sheet's minimum thickness, for the wear trend to run to", async () => {
    const hoist = await form(await approved('hoist-shoe-brake'));
    const sheet = getSheetType('hoist-shoe-brake')!;
    const expected = parseQuantity(demoInputs(sheet).liningMinThickness, 'length');
    for (const key of ['lining-thickness-shoe-a', 'lining-thickness-shoe-b'])
      expect(hoist.checks.find((c) => c.key === key)?.minimum).toBeCloseTo(expected, 12);
    expect(hoist.checks.find((c) => c.key === 'no-drag-shoe-a')?.minimum).toBeNull();
    // The caliper sheet declares no pad minimum: no line is drawn rather than a guessed one.
    const caliper = await form(await approved('caliper-disc-brake'));
    for (const c of caliper.checks) expect(c.minimum).toBeNull();
  });

  it('the printed record of a caliper brake has pad and caliper wording and a disc caution', async () => {
    ensurePoppler();
    const revisionId = await approved('caliper-disc-brake');
    const id = randomUUID();
    const created = await suite.ctx.request('POST', '/api/field-records', {
      as: 'technician',
      body: {
        id,
        positionId: suite.reg.positionId,
        revisionId,
        kind: 'periodic-inspection',
        performedAt: '2026-11-30T09:00:00Z',
        checks: fieldCheckKeys.map((key) => ({
          key,
          result: 'ok',
          ...(key.startsWith('lining-thickness') ? { value: 0.006 } : {}),
        })),
        findings: 'Pads even, no scoring.',
      },
    });
    expect(created.status, created.text).toBe(201);
    for (const m of created.body.measurements) expect(m.label).not.toMatch(DRUM_WORDS);
    const res = await fetch(`${suite.ctx.baseUrl}/api/field-records/${id}/pdf`, {
      headers: { authorization: `Bearer ${await suite.ctx.token('viewer')}` },
    });
    expect(res.status).toBe(200);
    const text = inspectPdf(
      Buffer.from(await res.arrayBuffer()),
      'field-record-caliper',
    ).text.replace(/\s+/g, ' ');
    expect(text).toContain('No drag on pad A when released');
    expect(text).toContain('Caliper condition');
    expect(text).toContain('lock the disc');
    expect(text).toContain('release unit supply');
    expect(text.match(DRUM_WORDS)?.[0] ?? null).toBeNull();
  });
});
