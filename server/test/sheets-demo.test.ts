import { sql } from 'kysely';
import { describe, expect, it } from 'vitest';
import { seedDemoScenario } from '../src/demo/seed-demo.js';
import { DemoAttachments } from '../src/attachments/demo-attachments.js';
import { CriteriaService } from '../src/criteria/criteria.service.js';
import { evaluateSheet } from '../src/calc/calc-engine.js';
import { contentHash } from '../src/revisions/revision-codes.js';
import { demoSuite } from './sheets-fixture.js';

describe('demo plant seed', () => {
  const suite = demoSuite();

  it('covers every state and sheet type with at least eight sheets, and runs only once', async () => {
    const list = await suite.ctx.request('GET', '/api/sheets?pageSize=50', { as: 'viewer' });
    expect(list.body.total).toBeGreaterThanOrEqual(8);
    expect(
      list.body.items.every((s: { site: { name: string } }) => s.site.name.includes('demo')),
    ).toBe(true);
    const revs = await suite.ctx.db
      .selectFrom('revisions as r')
      .innerJoin('sheets as s', 's.id', 'r.sheetId')
      .select(['r.state', 's.sheetType'])
      .execute();
    expect(new Set(revs.map((r) => r.state))).toEqual(
      new Set(['draft', 'in_check', 'returned', 'approved', 'superseded']),
    );
    expect(new Set(revs.map((r) => r.sheetType))).toEqual(
      new Set([
        'hoist-shoe-brake',
        'travel-shoe-brake',
        'drive-shoe-brake',
        'caliper-disc-brake',
        'disc-spring-stack',
      ]),
    );
    const before = await snapshot();
    expect(await seedDemoScenario(suite.ctx.app)).toBe(false);
    expect(
      (await suite.ctx.request('GET', '/api/sheets?pageSize=1', { as: 'viewer' })).body.total,
    ).toBe(list.body.total);
    expect(await snapshot()).toEqual(before);
  });

  it('holds each brake to the criteria of its drive: the rope-drum calipers to the hoist set', async () => {
    const rows = await suite.ctx.db
      .selectFrom('sheets as s')
      .innerJoin('brakePositions as p', 'p.id', 's.positionId')
      .select(['s.sheetType', 'p.motion', 's.criteriaSetId'])
      .execute();
    const seen = new Set(rows.map((r) => `${r.sheetType} on ${r.motion}: ${r.criteriaSetId}`));
    expect([...seen].sort()).toEqual([
      'caliper-disc-brake on hoist: crane-hoist',
      'disc-spring-stack on hoist: crane-hoist',
      'drive-shoe-brake on conveyor: general-industry',
      'hoist-shoe-brake on auxiliary-hoist: crane-hoist',
      'hoist-shoe-brake on hoist: crane-hoist',
      'travel-shoe-brake on bridge: travel-drive',
      'travel-shoe-brake on trolley: travel-drive',
    ]);
  });

  /** Every public table's row count and newest change: what a second run must leave alone. */
  async function snapshot() {
    const { rows } = await sql<{ tablename: string }>`
      select tablename from pg_tables where schemaname = 'public' order by tablename`.execute(
      suite.ctx.db,
    );
    const out: Record<string, string> = {};
    for (const { tablename } of rows) {
      const r = await sql<{ n: string; h: string | null }>`
        select count(*)::text as n, md5(string_agg(t::text, '|' order by t::text)) as h
        from ${sql.table(tablename)} t`.execute(suite.ctx.db);
      out[tablename] = `${r.rows[0]!.n}:${r.rows[0]!.h ?? ''}`;
    }
    return out;
  }

  it('stores evaluations the calc core gives for the stored inputs, with matching hashes', async () => {
    const rows = await suite.ctx.db
      .selectFrom('revisions as r')
      .innerJoin('sheets as s', 's.id', 'r.sheetId')
      .select([
        'r.inputs',
        'r.evaluation',
        'r.hash',
        'r.state',
        'r.criteriaSetId',
        'r.criteriaSetVersion',
        's.sheetType',
      ])
      .execute();
    const criteria = suite.ctx.app.get(CriteriaService);
    for (const r of rows) {
      const fresh = evaluateSheet(
        r.sheetType,
        r.inputs as never,
        await criteria.load(r.criteriaSetId, r.criteriaSetVersion),
      );
      const stored = r.evaluation as typeof fresh;
      expect(stored.results.length).toBe(fresh.results.length);
      for (const x of fresh.results) {
        const y = stored.results.find((v) => v.key === x.key)!;
        expect(Math.abs(y.value - x.value)).toBeLessThanOrEqual(
          1e-9 * Math.max(1, Math.abs(x.value)),
        );
      }
      if (r.state !== 'draft') expect(r.hash).toBe(contentHash(r.inputs, r.evaluation));
      if (r.state !== 'draft') {
        // Frozen records keep the inputs as the core used them, as the API stores them.
        const keys = (stored.resolvedInputs ?? []).map((x) => x.key);
        expect(keys.length).toBeGreaterThan(0);
        expect(keys.every((k) => k in (r.inputs as object))).toBe(true);
      }
      // No approved, current demo revision shows a failing check.
      if (r.state === 'approved') expect(stored.checks.filter((c) => !c.pass)).toEqual([]);
    }
  });

  it('has an approved sheet with a superseded predecessor and a returned revision with every comment answered', async () => {
    const list = await suite.ctx.request('GET', '/api/sheets?q=NRW-0001', { as: 'viewer' });
    const sheet = await suite.ctx.request('GET', `/api/sheets/${list.body.items[0].id}`, {
      as: 'viewer',
    });
    expect(
      sheet.body.revisions.map((r: { label: string; state: string }) => `${r.label}:${r.state}`),
    ).toEqual(['A:superseded', 'B:superseded', 'C:approved']);
    const a = await suite.ctx.request('GET', `/api/revisions/${sheet.body.revisions[0].id}`, {
      as: 'viewer',
    });
    expect(a.body.supersededBy.label).toBe('B');
    const verify = await suite.ctx.request('GET', `/api/verify/${a.body.verificationCode}`);
    expect(verify.body).toMatchObject({ current: false, newerApproved: { revisionLabel: 'C' } });

    const returned = await suite.ctx.request('GET', '/api/sheets?state=returned', {
      as: 'engineer',
    });
    const rev = returned.body.items[0].latest.id;
    const comments = await suite.ctx.request('GET', `/api/revisions/${rev}/comments`, {
      as: 'engineer',
    });
    // Every comment is answered; the request for a data sheet stays open until it is attached.
    expect(
      comments.body.items
        .map((c: { body: string; resolved: boolean }) => [c.body.slice(0, 30), c.resolved])
        .sort(),
    ).toEqual([
      ['Please attach the thruster dat', false],
      ['Use the wheel load with the tr', true],
    ]);
    for (const c of comments.body.items) expect(c.replies.length).toBe(1);
    const audit = await suite.ctx.request('GET', `/api/sheets/${returned.body.items[0].id}/audit`, {
      as: 'viewer',
    });
    expect(audit.body.items.map((e: { action: string }) => e.action)).toContain(
      'revision.returned',
    );
  });

  it('attaches the generated data sheet once, through the object storage', async () => {
    const demo = suite.ctx.app.get(DemoAttachments);
    // The seed ran after the app started, so the start-up pass found nothing to attach.
    expect(await demo.ensure()).toBe(2);
    expect(await demo.ensure()).toBe(0);
    const rows = await suite.ctx.db.selectFrom('attachments').select(['id', 'fileName']).execute();
    expect(rows.length).toBeGreaterThanOrEqual(1);
    const dl = await suite.ctx.request('GET', `/api/attachments/${rows[0].id}/download`, {
      as: 'engineer',
    });
    expect(dl.status).toBe(200);
    expect(dl.text).toContain('DEMO DATA SHEET');
  });
});
