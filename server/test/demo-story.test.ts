import { describe, expect, it } from 'vitest';
import { fieldCheckKeys } from '@holdfast/shared';
import { demoSuite } from './sheets-fixture.js';

/** The demo's story as made through the services: its dates, its field records, its notes. */
describe('demo story', () => {
  const suite = demoSuite();

  it('dates its story in the past, and sends no mail about it', async () => {
    const revs = await suite.ctx.db
      .selectFrom('revisions as r')
      .innerJoin('sheets as s', 's.id', 'r.sheetId')
      .select(['s.documentNumber', 'r.label', 'r.approvedAt', 'r.supersededAt', 'r.submittedAt'])
      .where('s.documentNumber', '=', 'HF-NRW-0001')
      .orderBy('r.seq')
      .execute();
    const daysAgo = (d: Date | null) => Math.round((Date.now() - (d?.getTime() ?? 0)) / 86_400_000);
    expect(revs.map((r) => [r.label, daysAgo(r.approvedAt), daysAgo(r.supersededAt)])).toEqual([
      ['A', 120, 30],
      ['B', 30, 0],
      ['C', 0, daysAgo(null)],
    ]);
    const audit = await suite.ctx.db.selectFrom('auditEvents').select('at').execute();
    expect(audit.filter((e) => e.at.getTime() > Date.now())).toEqual([]);
    // The plant was registered ten days before its oldest sheet (200 days ago) was begun.
    expect(Math.max(...audit.map((e) => daysAgo(e.at)))).toBe(210);
    const register = await Promise.all(
      (['sites', 'machines', 'brakePositions'] as const).map((t) =>
        suite.ctx.db.selectFrom(t).select('createdAt').execute(),
      ),
    );
    expect(new Set(register.flat().map((r) => daysAgo(r.createdAt)))).toEqual(new Set([210]));
    // Lists sort and show sheets and queue items by their last change: that is in the story too.
    const sheets = await suite.ctx.db
      .selectFrom('sheets as s')
      .innerJoin('revisions as r', 'r.id', 's.latestRevisionId')
      .select(['s.documentNumber', 's.updatedAt', 'r.updatedAt as revisionUpdatedAt'])
      .where('s.documentNumber', 'in', ['HF-NRW-0002', 'HF-NRW-0008'])
      .orderBy('s.documentNumber')
      .execute();
    expect(
      sheets.map((x) => [x.documentNumber, daysAgo(x.updatedAt), daysAgo(x.revisionUpdatedAt)]),
    ).toEqual([
      ['HF-NRW-0002', 3, 3],
      ['HF-NRW-0008', 29, 29],
    ]);
    expect(await suite.ctx.db.selectFrom('outbox').select('id').execute()).toEqual([]);
  });

  it('keeps the field records of the story: a wear history, an overdue brake, one to countersign', async () => {
    const records = await suite.ctx.db
      .selectFrom('fieldRecords as f')
      .innerJoin('brakePositions as p', 'p.id', 'f.positionId')
      .innerJoin('revisions as r', 'r.id', 'f.revisionId')
      .select(['p.tag', 'r.label', 'f.status', 'f.performedAt', 'f.outOfTolerance'])
      .orderBy('f.performedAt')
      .execute();
    const days = (d: Date) => Math.round((Date.now() - d.getTime()) / 86_400_000);
    expect(
      records.map(
        (r) =>
          `${r.tag} ${r.label} ${r.status} ${days(r.performedAt)}${r.outOfTolerance ? ' out' : ''}`,
      ),
    ).toEqual([
      'MH-B1 A countersigned 112',
      'MH-B1 A countersigned 92',
      'MH-B1 A countersigned 72',
      'TR-B1 A countersigned 55',
      'MH-B1 A countersigned 52',
      'MH-B1 A countersigned 32',
      'MH-B1 A countersigned 12',
      'DB-1 B signed 3 out',
    ]);
    const signatures = await suite.ctx.db
      .selectFrom('fieldRecordSignatures')
      .select('signedAt')
      .execute();
    expect(signatures.every((s) => s.signedAt.getTime() < Date.now() - 86_400_000)).toBe(true);
    const due = await suite.ctx.request('GET', '/api/field-records/due', { as: 'checker' });
    expect(due.body.overdue.map((d: { positionTag: string }) => d.positionTag)).toContain('TR-B1');
    expect(due.body.awaitingCountersign.map((r: { positionTag: string }) => r.positionTag)).toEqual(
      ['DB-1'],
    );
  });

  it('signs no demo field record with a check item unanswered, as the server refuses to', async () => {
    const signed = await suite.ctx.db
      .selectFrom('fieldRecords')
      .select('id')
      .where('status', '<>', 'draft')
      .execute();
    expect(signed.length).toBeGreaterThan(0);
    const checks = await suite.ctx.db
      .selectFrom('fieldRecordChecks')
      .select(['recordId', 'key'])
      .where(
        'recordId',
        'in',
        signed.map((r) => r.id),
      )
      .execute();
    for (const r of signed) {
      const keys = checks.filter((c) => c.recordId === r.id).map((c) => c.key);
      expect(keys.sort(), r.id).toEqual([...fieldCheckKeys].sort());
    }
  });

  it('a demo change note says "no change on site" only where no field setting moved, "re-set" only where one did', async () => {
    const revs = await suite.ctx.db
      .selectFrom('revisions')
      .select(['sheetId', 'seq', 'label', 'changeNote', 'evaluation'])
      .orderBy('sheetId')
      .orderBy('seq')
      .execute();
    const settings = (e: unknown) =>
      new Map(
        ((e as { fieldSettings?: { key: string; value: number }[] }).fieldSettings ?? []).map(
          (f) => [f.key, f.value],
        ),
      );
    const moved = (a: Map<string, number>, b: Map<string, number>) =>
      [...new Set([...a.keys(), ...b.keys()])].filter((k) => {
        const x = a.get(k);
        const y = b.get(k);
        return x === undefined || y === undefined || Math.abs(x - y) > 1e-9 * Math.abs(x);
      });
    let told = 0;
    for (const [i, r] of revs.entries()) {
      const before = revs[i - 1];
      if (!before || before.sheetId !== r.sheetId) continue;
      const changed = moved(settings(before.evaluation), settings(r.evaluation));
      const where = `${r.label}: ${r.changeNote}`;
      if (/no change on site/i.test(r.changeNote)) {
        told++;
        expect(changed, where).toEqual([]);
      }
      if (/\bre-set\b/i.test(r.changeNote)) expect(changed.length, where).toBeGreaterThan(0);
    }
    expect(told).toBeGreaterThan(0);
  });

  it('field records hold a wear trend, an out-of-tolerance record with its reason, stored judgements', async () => {
    const rows = await suite.ctx.db
      .selectFrom('fieldRecords as f')
      .innerJoin('brakePositions as p', 'p.id', 'f.positionId')
      .select(['p.tag', 'f.id', 'f.status', 'f.performedAt', 'f.outOfTolerance'])
      .orderBy('f.performedAt')
      .execute();
    const mh = rows.filter((r) => r.tag === 'MH-B1');
    expect(mh.length).toBeGreaterThanOrEqual(6);
    const span = mh.at(-1)!.performedAt.getTime() - mh[0]!.performedAt.getTime();
    expect(span).toBeGreaterThan(90 * 86_400_000);
    const reserve = await suite.ctx.db
      .selectFrom('fieldRecordMeasurements')
      .select(['recordId', 'asFound', 'asLeft'])
      .where('settingKey', '=', 'reserveStroke')
      .where(
        'recordId',
        'in',
        mh.map((r) => r.id),
      )
      .execute();
    const series = mh.map((r) => {
      const m = reserve.find((x) => x.recordId === r.id)!;
      return m.asFound ?? m.asLeft!;
    });
    for (let i = 1; i < series.length; i++) expect(series[i]).toBeLessThan(series[i - 1]!);
    const out = rows.filter((r) => r.outOfTolerance);
    expect(out.map((r) => [r.tag, r.status])).toEqual([['DB-1', 'signed']]);
    const reason = await suite.ctx.db
      .selectFrom('fieldRecordMeasurements')
      .select('reason')
      .where('recordId', '=', out[0]!.id)
      .executeTakeFirstOrThrow();
    expect(reason.reason).not.toBe('');
    // Signed by the demo, so stored with the judgement they were signed with.
    const judged = await suite.ctx.db
      .selectFrom('fieldRecordMeasurements')
      .select(['recordId', 'target', 'dimension', 'asLeftVerdict'])
      .execute();
    expect(judged.length).toBeGreaterThan(0);
    expect(judged.every((m) => m.target !== null && m.dimension !== null)).toBe(true);
    const outRows = judged.filter(
      (m) => (m.asLeftVerdict as { status: string } | null)?.status === 'out',
    );
    expect([...new Set(outRows.map((m) => m.recordId))]).toEqual([out[0]!.id]);
    const tr = rows.filter((r) => r.tag === 'TR-B1');
    expect(Date.now() - tr.at(-1)!.performedAt.getTime()).toBeGreaterThan(30 * 86_400_000);
  });
});
