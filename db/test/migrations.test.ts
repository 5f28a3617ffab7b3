import { sql, type Kysely } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createMigrationDatabase } from '../src/connection.js';
import type { RefreshTokensTable, UsersTable } from '../src/database.js';
import { listMigrations, migrateDownToEmpty, migrateToLatest } from '../src/migrate.js';
import { createFreshDatabase } from './fresh-database.js';

// Keys of the hand-written interfaces; the compiler makes these lists complete and exact.
const usersKeys: Record<keyof UsersTable, true> = {
  id: true,
  email: true,
  displayName: true,
  initials: true,
  role: true,
  passwordHash: true,
  active: true,
  unitSystem: true,
  sessionVersion: true,
  numberFormat: true,
  createdAt: true,
  updatedAt: true,
};
const refreshKeys: Record<keyof RefreshTokensTable, true> = {
  id: true,
  userId: true,
  tokenHash: true,
  expiresAt: true,
  revokedAt: true,
  rotatedFrom: true,
  createdAt: true,
};
const camel = (s: string) => s.replace(/_([a-z0-9])/g, (_, c: string) => c.toUpperCase());

async function tables(db: Kysely<any>): Promise<string[]> {
  const { rows } = await sql<{ t: string }>`
    select table_name as t from information_schema.tables where table_schema = 'public' order by 1`.execute(
    db,
  );
  return rows.map((r) => r.t);
}

async function columns(db: Kysely<any>, table: string): Promise<string[]> {
  const { rows } = await sql<{ c: string }>`
    select column_name as c from information_schema.columns
    where table_schema = 'public' and table_name = ${table} order by 1`.execute(db);
  return rows.map((r) => camel(r.c)).sort();
}

describe('migrations', () => {
  let fresh: Awaited<ReturnType<typeof createFreshDatabase>>;

  let db: Kysely<any>;
  beforeAll(async () => {
    fresh = await createFreshDatabase('holdfast_migrations');
    db = createMigrationDatabase(fresh.url);
  });
  afterAll(async () => {
    await db?.destroy();
    await fresh?.drop();
  });

  it('go up from an empty database, every file in order', async () => {
    expect(await tables(db)).toEqual([]);
    const results = await migrateToLatest(db);
    const names = await listMigrations();
    expect(names.length).toBeGreaterThanOrEqual(2);
    expect(results.map((r) => r.migrationName)).toEqual(names);
    expect(results.every((r) => r.status === 'Success')).toBe(true);
    expect(await tables(db)).toEqual(
      expect.arrayContaining(['users', 'refresh_tokens', 'kysely_migration']),
    );
    expect(await migrateToLatest(db)).toEqual([]);
  });

  it('match the typed DB interface for the foundation tables', async () => {
    expect(await columns(db, 'users')).toEqual(Object.keys(usersKeys).sort());
    expect(await columns(db, 'refresh_tokens')).toEqual(Object.keys(refreshKeys).sort());
  });

  it('enforce the users constraints in the database itself', async () => {
    const user = (email: string, extra: Record<string, unknown> = {}) =>
      db
        .insertInto('users')
        .values({
          email,
          display_name: 'Test Person',
          initials: 'TP',
          role: 'viewer',
          password_hash: 'x',
          ...extra,
        })
        .execute();
    await user('one@holdfast.test');
    await expect(user('one@holdfast.test')).rejects.toMatchObject({ code: '23505' });
    await expect(user('One@holdfast.test')).rejects.toMatchObject({ code: '23514' });
    await expect(user('two@holdfast.test', { role: 'owner' })).rejects.toMatchObject({
      code: '23514',
    });
    await expect(user('three@holdfast.test', { unit_system: 'metric' })).rejects.toMatchObject({
      code: '23514',
    });
    await expect(user('four@holdfast.test', { initials: 'toolong' })).rejects.toMatchObject({
      code: '23514',
    });
    const before = await db.selectFrom('users').select('updated_at').executeTakeFirstOrThrow();
    await sql`select pg_sleep(0.01)`.execute(db);
    await db.updateTable('users').set({ display_name: 'Renamed Person' }).execute();
    const after = await db.selectFrom('users').select('updated_at').executeTakeFirstOrThrow();
    expect((after.updated_at as Date).getTime()).toBeGreaterThan(
      (before.updated_at as Date).getTime(),
    );
    await db.deleteFrom('users').execute();
  });

  it('go down to an empty schema, and up again, also with a technician signed up', async () => {
    // The role came with the field records; stepping back below them must not fail on one.
    await db
      .insertInto('users')
      .values({
        email: 'fitter@holdfast.test',
        display_name: 'Test Fitter',
        initials: 'TF',
        role: 'technician',
        password_hash: 'x',
      })
      .execute();
    const down = await migrateDownToEmpty(db);
    expect(down.every((r) => r.status === 'Success' && r.direction === 'Down')).toBe(true);
    expect((await tables(db)).filter((t) => !t.startsWith('kysely_'))).toEqual([]);
    const { rows } = await sql<{ n: number }>`
      select count(*)::int as n from pg_proc p join pg_namespace s on s.oid = p.pronamespace
      where s.nspname = 'public'`.execute(db);
    expect(rows[0]?.n).toBe(0);
    const { rows: extensions } = await sql<{
      name: string;
    }>`select extname as name from pg_extension`.execute(db);
    expect(extensions.map((e) => e.name)).toEqual(['plpgsql']);
    const { rows: types } = await sql<{ n: number }>`
      select count(*)::int as n from pg_type t join pg_namespace s on s.oid = t.typnamespace
      where s.nspname = 'public' and t.typtype in ('e', 'd', 'c') and t.typrelid = 0`.execute(db);
    expect(types[0]?.n).toBe(0);
    expect((await migrateToLatest(db)).length).toBe((await listMigrations()).length);
  });
});
