import { randomUUID } from 'node:crypto';
import { sql } from 'kysely';
import { describe, expect, it } from 'vitest';
import { fieldCheckKeys } from '@holdfast/shared';
import { ensurePoppler, inspectPdf } from '@holdfast/print/testing';
import { approve, createSheet, sheetsSuite, submit } from './sheets-fixture.js';

const MM = 1e-3;

/**
 * A signed record keeps the verdicts it was signed with. A calc release that declares another
 * tolerance is simulated by giving the revision's frozen evaluation a tighter band for the main
 * spring length (as superuser, past the revision's own freeze): the tolerance a read would take
 * today. A draft follows it; a signed and a countersigned record do not.
 */
describe('a signed field record keeps the judgement it was signed with', () => {
  const suite = sheetsSuite();

  it('verdicts, outOfTolerance and the printout stay when the declared tolerance changes', async () => {
    const sheet = await createSheet(suite.ctx, suite.reg);
    const rev = await submit(suite.ctx, sheet.revisions[0].id);
    await approve(suite.ctx, rev.id);
    const form = await suite.ctx.request('GET', `/api/revisions/${rev.id}/field-form`, {
      as: 'technician',
    });
    const spring = (form.body.targets as { settingKey: string; value: number }[]).find(
      (t) => t.settingKey === 'springLength',
    )!;
    // 0.3 mm long: inside today's ±0.5 mm (common practice), outside the ±0.1 mm set below.
    const asLeft = spring.value + 0.3 * MM;
    const make = async () => {
      const id = randomUUID();
      const res = await suite.ctx.request('POST', '/api/field-records', {
        as: 'technician',
        body: {
          id,
          positionId: suite.reg.positionId,
          revisionId: rev.id,
          kind: 'commissioning',
          performedAt: '2026-11-30T09:00:00Z',
          measurements: [{ settingKey: 'springLength', asFound: spring.value, asLeft }],
          checks: fieldCheckKeys.map((key) => ({ key, result: 'ok' })),
        },
      });
      expect(res.status, res.text).toBe(201);
      return id;
    };
    const get = async (id: string) =>
      (await suite.ctx.request('GET', `/api/field-records/${id}`, { as: 'engineer' })).body;
    const signed = await make();
    const countersigned = await make();
    const draft = await make();
    for (const id of [signed, countersigned]) {
      const res = await suite.ctx.request('POST', `/api/field-records/${id}/sign`, {
        as: 'technician',
        body: {},
      });
      expect(res.status, res.text).toBe(200);
    }
    const before = await get(signed);
    expect(before.measurements[0].asLeftVerdict.status).toBe('in');
    expect(before.outOfTolerance).toBe(false);

    // The tighter band, as a new calc release might declare it.
    await suite.ctx.db.transaction().execute(async (trx) => {
      await sql`set local session_replication_role = replica`.execute(trx);
      await sql`update revisions set evaluation = jsonb_set(evaluation, ${sql.lit(
        `{fieldSettings,${await settingIndex(rev.id, 'springLength')},tolerance}`,
      )}, ${JSON.stringify({
        band: { kind: 'absolute', minus: 0.1 * MM, plus: 0.1 * MM },
        source: 'test band',
        confidence: 'common practice',
      })}::jsonb) where id = ${rev.id}`.execute(trx);
    });
    const cs = await suite.ctx.request('POST', `/api/field-records/${countersigned}/countersign`, {
      as: 'checker',
      body: {},
    });
    expect(cs.status, cs.text).toBe(200);

    // A draft is judged now: the new band puts it out, and a save stores that.
    const d = await get(draft);
    expect(d.measurements[0].asLeftVerdict.status).toBe('out');
    expect(d.measurements[0].tolerance.source).toBe('test band');
    const saved = await suite.ctx.request('PATCH', `/api/field-records/${draft}`, {
      as: 'technician',
      body: { findings: 'Re-read after the band changed.' },
    });
    expect(saved.status, saved.text).toBe(200);
    expect(saved.body.outOfTolerance).toBe(true);
    const row = await suite.ctx.db
      .selectFrom('fieldRecordMeasurements')
      .select(['asLeftVerdict', 'tolerance', 'target', 'unit', 'dimension'])
      .where('recordId', '=', draft)
      .executeTakeFirstOrThrow();
    expect(row).toMatchObject({
      asLeftVerdict: { status: 'out' },
      tolerance: { source: 'test band' },
      target: spring.value,
      dimension: 'length',
    });

    // Signed and countersigned records keep what they were signed with.
    const after = await get(signed);
    expect(after.measurements).toEqual(before.measurements);
    expect(after.outOfTolerance).toBe(false);
    const c = await get(countersigned);
    expect(c.status).toBe('countersigned');
    expect(c.measurements).toEqual(before.measurements);
    expect(c.measurements[0].tolerance.source).toBe('common practice');

    // A row signed before judgements were stored holds none: it is judged now, as before
    // (migration 20261205030000). Simulated by clearing the stored judgement as superuser.
    await suite.ctx.db.transaction().execute(async (trx) => {
      await sql`set local session_replication_role = replica`.execute(trx);
      await sql`update field_record_measurements set target = null, unit = null, dimension = null,
        tolerance = null, as_found_verdict = null, as_left_verdict = null
        where record_id = ${countersigned}`.execute(trx);
    });
    const legacy = await get(countersigned);
    expect(legacy.measurements[0].asLeftVerdict.status).toBe('out');
    expect(legacy.outOfTolerance).toBe(false);

    ensurePoppler();
    const pdf = await fetch(`${suite.ctx.baseUrl}/api/field-records/${signed}/pdf`, {
      headers: { authorization: `Bearer ${await suite.ctx.token('viewer')}` },
    });
    expect(pdf.status).toBe(200);
    const text = inspectPdf(Buffer.from(await pdf.arrayBuffer()), 'frozen-judgement').text.replace(
      /\s+/g,
      ' ',
    );
    expect(text).toMatch(/± 0\.50* mm/);
    expect(text).not.toMatch(/± 0\.10* mm/);
    expect(text).not.toMatch(/\bOUT\b/);
    expect(text).toContain('within');
  });

  async function settingIndex(revisionId: string, key: string): Promise<number> {
    const r = await suite.ctx.db
      .selectFrom('revisions')
      .select('evaluation')
      .where('id', '=', revisionId)
      .executeTakeFirstOrThrow();
    const i = (r.evaluation as { fieldSettings: { key: string }[] }).fieldSettings.findIndex(
      (s) => s.key === key,
    );
    expect(i).toBeGreaterThanOrEqual(0);
    return i;
  }
});
