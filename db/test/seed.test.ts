import type { Kysely } from 'kysely';
import { fieldCheckKeys } from '@holdfast/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDatabase, createMigrationDatabase } from '../src/connection.js';
import type { DB } from '../src/database.js';
import { DEMO_PASSWORD, demoUsers } from '../src/demo-users.js';
import { migrateToLatest } from '../src/migrate.js';
import { verifyPassword } from '../src/passwords.js';
import { listSeeds, seed } from '../src/seed.js';
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
  }, 180_000); // six argon2id hashes plus every feature's demo data, on a busy machine

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

  it('signs no demo field record with a check item unanswered, as the server refuses to', async () => {
    const signed = await db
      .selectFrom('fieldRecords')
      .select('id')
      .where('status', '<>', 'draft')
      .execute();
    expect(signed.length).toBeGreaterThan(0);
    const checks = await db
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
    const revs = await db
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
