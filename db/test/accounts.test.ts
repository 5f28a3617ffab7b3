import type { Kysely } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDatabase, createMigrationDatabase } from '../src/connection.js';
import { createAdmin } from '../src/create-admin.js';
import type { DB } from '../src/database.js';
import { demoRequested } from '../src/demo-flag.js';
import { migrateToLatest } from '../src/migrate.js';
import { verifyPassword } from '../src/passwords.js';
import { checkPasswordStrength } from '../src/password-strength.js';
import { seed } from '../src/seed.js';
import { createFreshDatabase } from './fresh-database.js';

describe('password strength', () => {
  it('refuses short, common and guessable passwords, whatever their length', () => {
    for (const weak of [
      'short',
      'password1234',
      'aaaaaaaaaaaaaaaa',
      'qwertyuiopasdf',
      '123456789012',
      'Holdfast2026!',
      'erin.vale@holdfast.test',
    ]) {
      expect(checkPasswordStrength(weak, ['erin.vale@holdfast.test', 'Erin Vale']).ok, weak).toBe(
        false,
      );
    }
    expect(checkPasswordStrength('password1234').message).toMatch(/too easy to guess/);
  });

  it('accepts passphrases and random strings', () => {
    expect(checkPasswordStrength('copper lantern orbit meadow').ok).toBe(true);
    expect(checkPasswordStrength('K8#vLq2!pZr9w').ok).toBe(true);
  });
});

describe('demo flag', () => {
  it('is on by default except in production, where only HOLDFAST_DEMO=1 turns it on', () => {
    expect(demoRequested({})).toBe(true);
    expect(demoRequested({ NODE_ENV: 'production' })).toBe(false);
    expect(demoRequested({ NODE_ENV: 'production', HOLDFAST_DEMO: '1' })).toBe(true);
    expect(demoRequested({ HOLDFAST_DEMO: '0' })).toBe(false);
  });
});

describe('accounts in a fresh database', () => {
  let fresh: Awaited<ReturnType<typeof createFreshDatabase>>;
  let db: Kysely<DB>;
  beforeAll(async () => {
    fresh = await createFreshDatabase('holdfast_accounts');
    const plain = createMigrationDatabase(fresh.url);
    await migrateToLatest(plain);
    await plain.destroy();
    db = createDatabase({ connectionString: fresh.url, max: 2 });
  });
  afterAll(async () => {
    await db?.destroy();
    await fresh?.drop();
  });

  it('seeds no demo users when the demo is not asked for', async () => {
    const names = await seed(db, false);
    expect(names.some((n) => n.includes('_demo_'))).toBe(false);
    const users = await db.selectFrom('users').select('email').execute();
    expect(users).toEqual([]);
  });

  it('creates the first admin, refusing a weak password and a taken e-mail', async () => {
    const admin = { email: 'Lead@Plant.test', displayName: 'Ada Quill', initials: 'AQ' };
    await expect(createAdmin(db, { ...admin, password: 'password1234' })).rejects.toThrow(
      /password is refused/,
    );
    const id = await createAdmin(db, { ...admin, password: 'copper lantern orbit meadow' });
    const row = await db
      .selectFrom('users')
      .selectAll()
      .where('id', '=', id)
      .executeTakeFirstOrThrow();
    expect(row).toMatchObject({ email: 'lead@plant.test', role: 'admin', active: true });
    expect(await verifyPassword(row.passwordHash, 'copper lantern orbit meadow')).toBe(true);
    await expect(
      createAdmin(db, { ...admin, password: 'another strong pass phrase' }),
    ).rejects.toThrow(/already exists/);
  });
});
