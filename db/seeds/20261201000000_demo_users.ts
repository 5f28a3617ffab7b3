import type { Kysely } from 'kysely';
import type { DB } from '../src/database.js';
import { DEMO_PASSWORD, demoUsers } from '../src/demo-users.js';
import { hashPassword } from '../src/passwords.js';

/** Adds the demo users that are missing; never changes users that exist (idempotent). */
export async function seed(db: Kysely<DB>): Promise<void> {
  const existing = await db.selectFrom('users').select('email').execute();
  const known = new Set(existing.map((u) => u.email));
  const missing = demoUsers.filter((u) => !known.has(u.email));
  for (const user of missing) {
    await db
      .insertInto('users')
      .values({ ...user, passwordHash: await hashPassword(DEMO_PASSWORD) })
      .execute();
  }
}
