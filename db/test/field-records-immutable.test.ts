import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import pg from 'pg';
import { failure, provisionedDatabase, type ProvisionedDatabase } from './provisioned-database.js';

/**
 * A countersigned field record is a record: the server's own credentials (holdfast_app) cannot
 * change or delete it, its measurements, checks, signatures or photos, nor truncate the tables.
 * Provisioned as `npm start` does it (provisioned-database.ts).
 */
describe('field records in PostgreSQL, as the app role', () => {
  let db: ProvisionedDatabase;
  let app: pg.Client;
  let positionId: string;
  let revisionId: string;
  let userId: string;
  let otherId: string;

  const refused = (text: string, values: unknown[] = []) => failure(app.query(text, values));
  // A stored verdict, reduced to what these tests need of it.
  const IN = JSON.stringify({ status: 'in' });
  const OUT = JSON.stringify({ status: 'out' });
  // Every column of the stored judgement, rewritten as a release with another tolerance might.
  const rejudge = [
    [
      `update field_record_measurements set tolerance = '{"band":{"kind":"atLeast"}}' where record_id = $1`,
    ],
    [`update field_record_measurements set as_found_verdict = $2 where record_id = $1`, OUT],
    [`update field_record_measurements set as_left_verdict = $2 where record_id = $1`, OUT],
    [`update field_record_measurements set as_left_verdict = null where record_id = $1`],
    [`update field_record_measurements set target = 0.25 where record_id = $1`],
    [`update field_record_measurements set unit = 'in' where record_id = $1`],
    [`update field_record_measurements set dimension = 'force' where record_id = $1`],
  ] as const;

  async function newRecord(): Promise<string> {
    const id = randomUUID();
    await app.query(
      `insert into field_records (id, position_id, revision_id, kind, performed_at, created_by)
       values ($1, $2, $3, 'periodic-inspection', now(), $4)`,
      [id, positionId, revisionId, userId],
    );
    await app.query(
      `insert into field_record_measurements (record_id, setting_key, ordinal, as_found, as_left,
         target, unit, dimension, tolerance, as_found_verdict, as_left_verdict)
       values ($1, 'springLength', 0, 0.2, 0.2001, 0.2, 'mm', 'length', $2, $3, $3)`,
      [id, JSON.stringify({ band: { kind: 'absolute', minus: 5e-4, plus: 5e-4 } }), IN],
    );
    await app.query(
      `insert into field_record_checks (record_id, key, result) values ($1, 'no-drag-shoe-a', 'ok')`,
      [id],
    );
    return id;
  }
  async function sign(id: string) {
    await app.query(`update field_records set status = 'signed' where id = $1`, [id]);
    await app.query(
      `insert into field_record_signatures (record_id, kind, user_id, display_name, initials)
       values ($1, 'technician', $2, 'T', 'TT')`,
      [id, userId],
    );
  }
  async function countersign(id: string) {
    await app.query(
      `insert into field_record_signatures (record_id, kind, user_id, display_name, initials)
       values ($1, 'countersign', $2, 'C', 'CC')`,
      [id, otherId],
    );
    await app.query(`update field_records set status = 'countersigned' where id = $1`, [id]);
  }

  beforeAll(async () => {
    db = await provisionedDatabase('field_rec');
    app = db.app;
    const rev = await app.query(
      `select r.id, s.position_id from revisions r join sheets s on s.id = r.sheet_id limit 1`,
    );
    revisionId = rev.rows[0].id;
    positionId = rev.rows[0].position_id;
    const users = await app.query(`select id from users order by email limit 2`);
    userId = users.rows[0].id;
    otherId = users.rows[1].id;
  }, 120000);
  afterAll(() => db?.close());

  it('a draft can be edited and its parts replaced', async () => {
    const id = await newRecord();
    await app.query(`update field_records set findings = 'ok' where id = $1`, [id]);
    await app.query(`update field_record_measurements set as_left = 0.2 where record_id = $1`, [
      id,
    ]);
    await app.query(`delete from field_record_checks where record_id = $1`, [id]);
  });

  const addPhoto = (id: string) =>
    app.query(
      `insert into attachments (revision_id, file_name, content_type, size, sha256, storage_key, uploaded_by, field_record_id)
       values ($2, 'p.png', 'image/png', 1, repeat('a', 64), $3, $4, $1)`,
      [id, revisionId, `probe/${randomUUID()}`, userId],
    );

  it('signed: content and photos are frozen, only the countersignature may follow', async () => {
    const id = await newRecord();
    await addPhoto(id);
    await sign(id);
    expect((await failure(addPhoto(id))).code).toBe('HF001');
    expect((await refused(`delete from attachments where field_record_id = $1`, [id])).code).toBe(
      'HF001',
    );
    expect(
      (await refused(`update field_records set findings = 'x' where id = $1`, [id])).code,
    ).toBe('HF001');
    expect(
      (await refused(`update field_record_measurements set as_left = 1 where record_id = $1`, [id]))
        .code,
    ).toBe('HF001');
    expect(
      (
        await refused(
          `insert into field_record_checks (record_id, key, result) values ($1, 'linkage-condition', 'ok')`,
          [id],
        )
      ).code,
    ).toBe('HF001');
    expect((await refused(`delete from field_records where id = $1`, [id])).code).toBe('HF001');
  });

  it('the judgement stored with a measurement: changes with its draft, then frozen with it', async () => {
    const id = await newRecord();
    for (const [text, value] of rejudge) {
      await app.query(text, value === undefined ? [id] : [id, value]);
    }
    await sign(id);
    for (const [text, value] of rejudge) {
      const e = await refused(text, value === undefined ? [id] : [id, value]);
      expect(e.code, text).toBe('HF001');
    }
    const id2 = await newRecord();
    await sign(id2);
    await countersign(id2);
    for (const [text, value] of rejudge) {
      const e = await refused(text, value === undefined ? [id2] : [id2, value]);
      expect(e.code, text).toBe('HF001');
    }
    const row = await app.query(
      `select target, unit, dimension, as_left_verdict from field_record_measurements where record_id = $1`,
      [id2],
    );
    expect(row.rows[0]).toEqual({
      target: 0.2,
      unit: 'mm',
      dimension: 'length',
      as_left_verdict: { status: 'in' },
    });
  });

  it('a judgement is stored whole: no verdict without the target it was judged against', async () => {
    const id = await newRecord();
    const e = await refused(
      `update field_record_measurements set target = null where record_id = $1`,
      [id],
    );
    expect(e.code).toBe('23514');
    const e2 = await refused(
      `insert into field_record_measurements (record_id, setting_key, ordinal, as_left, as_left_verdict)
       values ($1, 'springForce', 1, 1000, $2)`,
      [id, IN],
    );
    expect(e2.code).toBe('23514');
  });

  it('countersigned: no update, no delete of the record or any part, no new photos', async () => {
    const id = await newRecord();
    await sign(id);
    await countersign(id);
    const attempts = [
      [`update field_records set findings = 'rewritten' where id = $1`, [id]],
      [`update field_records set status = 'draft' where id = $1`, [id]],
      [`delete from field_records where id = $1`, [id]],
      [`update field_record_measurements set as_left = 0.3 where record_id = $1`, [id]],
      [`delete from field_record_measurements where record_id = $1`, [id]],
      [`update field_record_checks set result = 'not-ok' where record_id = $1`, [id]],
      [`delete from field_record_checks where record_id = $1`, [id]],
      [`update field_record_signatures set display_name = 'Someone' where record_id = $1`, [id]],
      [`delete from field_record_signatures where record_id = $1`, [id]],
      [
        `insert into attachments (revision_id, file_name, content_type, size, sha256, storage_key, uploaded_by, field_record_id)
         values ($2, 'p.png', 'image/png', 1, repeat('a', 64), $3, $4, $1)`,
        [id, revisionId, `probe/${id}`, userId],
      ],
    ] as const;
    for (const [text, values] of attempts) {
      const e = await refused(text, [...values]);
      expect(e.code, text).toBe('HF001');
    }
    const row = await app.query(`select status, findings from field_records where id = $1`, [id]);
    expect(row.rows[0]).toEqual({ status: 'countersigned', findings: '' });
  });

  it('a draft cannot jump to countersigned', async () => {
    const id = await newRecord();
    const e = await refused(`update field_records set status = 'countersigned' where id = $1`, [
      id,
    ]);
    expect(e.code).toBe('HF001');
  });

  it('the field-record tables refuse TRUNCATE (the app role has no TRUNCATE either)', async () => {
    for (const t of [
      'field_records',
      'field_record_measurements',
      'field_record_checks',
      'field_record_signatures',
    ]) {
      const e = await refused(`truncate table ${t} cascade`);
      expect(e.code, t).toMatch(/42501|HF001/);
    }
  });

  it('the users table accepts the technician role', async () => {
    const { rows } = await app.query(
      `select pg_get_constraintdef(oid) as def from pg_constraint where conname = 'users_role_check'`,
    );
    expect(rows[0].def).toContain('technician');
  });
});
