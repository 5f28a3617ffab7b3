import { rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import type { Kysely } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDatabase, createMigrationDatabase } from '../src/connection.js';
import type { DB } from '../src/database.js';
import { DEMO_PASSWORD, demoUsers } from '../src/demo-users.js';
import { migrateToLatest } from '../src/migrate.js';
import { verifyPassword } from '../src/passwords.js';
import { listSeeds, seed, seedFolder } from '../src/seed.js';
import { createFreshDatabase } from './fresh-database.js';

describe('seed', () => {
  let fresh: Awaited<ReturnType<typeof createFreshDatabase>>;
  let db: Kysely<DB>;
  beforeAll(async () => {
    fresh = await createFreshDatabase('holdfast_seed');
    const plain = createMigrationDatabase(fresh.url);
    await migrateToLatest(plain);
    await plain.destroy();
    db = createDatabase({ connectionString: fresh.url, max: 2 });
  });
  afterAll(async () => {
    await db?.destroy();
    await fresh?.drop();
  });

  it('runs every seed module in name order, the demo users first', async () => {
    const names = await listSeeds();
    expect(names[0]).toBe('20261201000000_demo_users.js');
    expect([...names].sort()).toEqual(names);
    expect(await seed(db)).toEqual(names.map((n) => n.slice(0, -3)));
  }, 180_000); // seven argon2id hashes, on a busy machine

  it('runs no compiled seed whose source is gone (tsc -b leaves its output behind)', async () => {
    const stale = path.join(seedFolder, '20990101000000_demo_removed.js');
    await writeFile(stale, 'export async function seed() { throw new Error("stale seed ran"); }\n');
    try {
      expect(await listSeeds()).not.toContain('20990101000000_demo_removed.js');
      await seed(db);
    } finally {
      await rm(stale);
    }
  });

  it('creates one demo user per role plus a second engineer and checker, password holdfast-demo', async () => {
    const rows = await db.selectFrom('users').selectAll().orderBy('email').execute();
    const demo = rows.filter((r) => r.email.endsWith('@holdfast.test'));
    expect(demo.map((r) => r.email).sort()).toEqual(demoUsers.map((u) => u.email).sort());
    expect(new Set(demo.map((r) => r.role))).toEqual(
      new Set(['engineer', 'checker', 'viewer', 'admin', 'technician']),
    );
    const engineer = demo.find((r) => r.email === 'engineer@holdfast.test')!;
    expect(engineer).toMatchObject({
      displayName: 'Erin Vale',
      initials: 'EV',
      active: true,
      unitSystem: 'SI',
    });
    expect(engineer.passwordHash).toMatch(/^\$argon2id\$/);
    expect(await verifyPassword(engineer.passwordHash, DEMO_PASSWORD)).toBe(true);
    expect(await verifyPassword(engineer.passwordHash, 'something-else')).toBe(false);
  });

  it('is idempotent and keeps changes made since', async () => {
    await db
      .updateTable('users')
      .set({ displayName: 'Erin Vale-Moss' })
      .where('email', '=', 'engineer@holdfast.test')
      .execute();
    const before = await db.selectFrom('users').select(['id', 'email']).orderBy('email').execute();
    await seed(db);
    const after = await db.selectFrom('users').select(['id', 'email']).orderBy('email').execute();
    expect(after).toEqual(before);
    const erin = await db
      .selectFrom('users')
      .select('displayName')
      .where('email', '=', 'engineer@holdfast.test')
      .executeTakeFirstOrThrow();
    expect(erin.displayName).toBe('Erin Vale-Moss');
  }, 180_000);
});
