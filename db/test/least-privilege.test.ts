import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import pg from 'pg';
import { failure, provisionedDatabase, type ProvisionedDatabase } from './provisioned-database.js';

/**
 * The server's own credentials (holdfast_app) against the records it must not be able to destroy,
 * in a database provisioned as `npm start` does it (provisioned-database.ts).
 */
describe('least privilege: the app role', () => {
  let db: ProvisionedDatabase;
  let ownerUrl: string;
  let app: pg.Client;

  beforeAll(async () => {
    db = await provisionedDatabase('least_priv');
    ({ ownerUrl, app } = db);
  }, 120000);
  afterAll(() => db?.close());

  it('is neither superuser nor owner of anything it writes to', async () => {
    const { rows } = await app.query(
      `select rolsuper, rolcreaterole, rolcreatedb, rolbypassrls from pg_roles where rolname = current_user`,
    );
    expect(rows[0]).toEqual({
      rolsuper: false,
      rolcreaterole: false,
      rolcreatedb: false,
      rolbypassrls: false,
    });
    const owned = await app.query(
      `select count(*)::int as n from pg_class where relowner = (select oid from pg_roles where rolname = current_user)`,
    );
    expect(owned.rows[0].n).toBe(0);
    // ...and still does its job: reads and writes rows.
    const users = await app.query(`select count(*)::int as n from users`);
    expect(users.rows[0].n).toBeGreaterThan(0);
    await app.query(
      `insert into audit_events (action, entity, entity_id) values ('probe', 'test', 'x')`,
    );
  });

  it('cannot switch triggers off for its session', async () => {
    const e = await failure(app.query(`set session_replication_role = replica`));
    expect(e.code).toBe('42501');
  });

  it('cannot disable the immutability and append-only triggers', async () => {
    for (const [table, trigger] of [
      ['revisions', 'revisions_guard'],
      ['audit_events', 'audit_events_append_only'],
    ]) {
      const e = await failure(app.query(`alter table ${table} disable trigger ${trigger}`));
      expect(e.code).toBe('42501'); // must be owner
    }
    const all = await failure(app.query(`alter table revisions disable trigger all`));
    expect(all.code).toBe('42501');
  });

  it('cannot truncate the audit trail or the revisions, and neither can the owner', async () => {
    for (const table of ['audit_events', 'revisions']) {
      const e = await failure(app.query(`truncate ${table} cascade`));
      expect(e.code).toBe('42501');
    }
    const owner = new pg.Client({ connectionString: ownerUrl });
    await owner.connect();
    try {
      for (const table of ['audit_events', 'revisions']) {
        const e = await failure(owner.query(`truncate ${table} cascade`));
        expect(e.message).toMatch(/cannot be truncated/);
      }
    } finally {
      await owner.end();
    }
  });

  it('cannot change an approved revision or delete audit rows', async () => {
    const approved = await app.query(`select id from revisions where state = 'approved' limit 1`);
    expect(approved.rows).toHaveLength(1);
    const id = approved.rows[0].id as string;
    const edit = await failure(
      app.query(`update revisions set inputs = '{}'::jsonb where id = $1`, [id]),
    );
    expect(edit.message).toMatch(/immutable/);
    const drop = await failure(app.query(`delete from revisions where id = $1`, [id]));
    expect(drop.message).toMatch(/cannot be deleted/);
    const audit = await failure(app.query(`delete from audit_events`));
    expect(audit.message).toMatch(/append-only/);
    const rewrite = await failure(app.query(`update audit_events set action = 'nothing'`));
    expect(rewrite.message).toMatch(/append-only/);
  });

  it('cannot change the schema, but gets rows of tables that later migrations add', async () => {
    const ddl = await failure(app.query(`create table mine (id int)`));
    expect(ddl.code).toBe('42501');
    const drop = await failure(app.query(`drop table audit_events`));
    expect(drop.code).toBe('42501');
    const migrations = await failure(app.query(`delete from kysely_migration`));
    expect(migrations.code).toBe('42501');
    // A table made later by the owner, as a future migration would: granted by default privileges.
    const owner = new pg.Client({ connectionString: ownerUrl });
    await owner.connect();
    await owner.query(`create table later_feature (id serial primary key, note text)`);
    await owner.end();
    await app.query(`insert into later_feature (note) values ('ok')`);
    expect((await app.query(`select note from later_feature`)).rows).toEqual([{ note: 'ok' }]);
    const trunc = await failure(app.query(`truncate later_feature`));
    expect(trunc.code).toBe('42501');
  });
});
