import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import pg from 'pg';
import { createDatabase, createMigrationDatabase } from '../src/connection.js';
import { migrateToLatest } from '../src/migrate.js';
import { seed } from '../src/seed.js';
import { createFreshDatabase } from './fresh-database.js';
// @ts-expect-error plain ESM helper without type declarations
import * as roles from '../../scripts/lib/db-roles.mjs';

/**
 * The server's own credentials (holdfast_app) against the records it must not be able to destroy.
 * The database is provisioned exactly as `npm start` does it (scripts/lib/db-roles.mjs), migrated
 * and seeded as the owner role; DATABASE_URL is the cluster's superuser, whose password is the
 * secret the role passwords derive from.
 */
describe('least privilege: the app role', () => {
  let fresh: Awaited<ReturnType<typeof createFreshDatabase>>;
  let ownerUrl: string;
  let appUrl: string;
  let app: pg.Client;

  const as = (base: string, role: string) => {
    const u = new URL(base);
    const secret = decodeURIComponent(new URL(process.env.DATABASE_URL!).password);
    u.username = role;
    u.password = encodeURIComponent(roles.rolePassword(secret, role) as string);
    return u.toString();
  };
  const failure = (p: Promise<unknown>) =>
    p.then(
      () => {
        throw new Error('the statement succeeded');
      },
      (e: { code?: string; message: string }) => e,
    );

  beforeAll(async () => {
    fresh = await createFreshDatabase('least_priv');
    const name = new URL(fresh.url).pathname.slice(1);
    const secret = decodeURIComponent(new URL(process.env.DATABASE_URL!).password);
    const admin = new pg.Client({ connectionString: fresh.url });
    await admin.connect();
    await admin.query(roles.clusterRolesSql(secret) as string);
    await admin.query(roles.databaseRolesSql(name) as string);
    await admin.end();
    ownerUrl = as(fresh.url, roles.OWNER_ROLE);
    appUrl = as(fresh.url, roles.APP_ROLE);
    const plain = createMigrationDatabase(ownerUrl);
    await migrateToLatest(plain);
    await plain.destroy();
    const owned = createDatabase({ connectionString: ownerUrl, max: 1 });
    await seed(owned);
    await owned.destroy();
    app = new pg.Client({ connectionString: appUrl });
    await app.connect();
  }, 120000);
  afterAll(async () => {
    await app?.end();
    await fresh?.drop();
  });

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
