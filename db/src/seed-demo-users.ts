import type { Kysely } from 'kysely';
import type { DB } from './database.js';
import { DEMO_PASSWORD, demoUsers } from './demo-users.js';
import { hashPassword } from './passwords.js';

/**
 * Adds the demo users that are missing; never changes users that exist (idempotent).
 * `passwordHash` lets tests reuse one precomputed hash instead of paying argon2 per user.
 */
export async function seedDemoUsers(db: Kysely<DB>, passwordHash?: string): Promise<void> {
  const existing = await db.selectFrom('users').select('email').execute();
  const known = new Set(existing.map((u) => u.email));
  for (const user of demoUsers.filter((u) => !known.has(u.email))) {
    await db
      .insertInto('users')
      .values({ ...user, passwordHash: passwordHash ?? (await hashPassword(DEMO_PASSWORD)) })
      .execute();
  }
}
