import pg from 'pg';
import { createDatabase, createMigrationDatabase } from '../src/connection.js';
import { migrateToLatest } from '../src/migrate.js';
import { seed } from '../src/seed.js';
import { insertApprovedSheet } from './approved-sheet.js';
import { createFreshDatabase } from './fresh-database.js';
// @ts-expect-error plain ESM helper without type declarations
import * as roles from '../../scripts/lib/db-roles.mjs';

export interface ProvisionedDatabase {
  /** The owner's URL (migrations, seeds). */
  ownerUrl: string;
  /** The server's own URL: it may only read and write rows. */
  appUrl: string;
  /** Signed in as the app role. */
  app: pg.Client;
  close(): Promise<void>;
}

/**
 * A fresh database provisioned exactly as `npm start` does it (scripts/lib/db-roles.mjs),
 * migrated and seeded as the owner role (plus one approved sheet, approved-sheet.ts), with a client signed in as the app role. DATABASE_URL
 * is the cluster's superuser, whose password is the secret the role passwords derive from.
 */
export async function provisionedDatabase(label: string): Promise<ProvisionedDatabase> {
  const fresh = await createFreshDatabase(label);
  const name = new URL(fresh.url).pathname.slice(1);
  const secret = decodeURIComponent(new URL(process.env.DATABASE_URL!).password);
  const as = (role: string) => {
    const u = new URL(fresh.url);
    u.username = role;
    u.password = encodeURIComponent(roles.rolePassword(secret, role) as string);
    return u.toString();
  };
  const admin = new pg.Client({ connectionString: fresh.url });
  await admin.connect();
  await admin.query(roles.clusterRolesSql(secret) as string);
  await admin.query(roles.databaseRolesSql(name) as string);
  await admin.end();
  const ownerUrl = as(roles.OWNER_ROLE as string);
  const appUrl = as(roles.APP_ROLE as string);
  const plain = createMigrationDatabase(ownerUrl);
  await migrateToLatest(plain);
  await plain.destroy();
  const owned = createDatabase({ connectionString: ownerUrl, max: 1 });
  await seed(owned);
  await insertApprovedSheet(owned);
  await owned.destroy();
  const app = new pg.Client({ connectionString: appUrl });
  await app.connect();
  return {
    ownerUrl,
    appUrl,
    app,
    close: async () => {
      await app.end();
      await fresh.drop();
    },
  };
}

/** The error a statement failed with; the test fails if it succeeded. */
export function failure(p: Promise<unknown>): Promise<{ code?: string; message: string }> {
  return p.then(
    () => {
      throw new Error('the statement succeeded');
    },
    (e: { code?: string; message: string }) => e,
  );
}
