import type { Kysely } from 'kysely';
import type { DB } from '../src/database.js';
import { seedDemoUsers } from '../src/seed-demo-users.js';

/** One demo user per role, plus a second engineer and checker (see src/demo-users.ts). */
export async function seed(db: Kysely<DB>): Promise<void> {
  await seedDemoUsers(db);
}
