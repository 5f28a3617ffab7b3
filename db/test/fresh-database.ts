import { randomBytes } from 'node:crypto';
import pg from 'pg';

/**
 * A brand-new, empty database on the same PostgreSQL server as DATABASE_URL, so migration tests
 * never disturb the database other suites use. Returns its URL and a drop function.
 */
export async function createFreshDatabase(
  label: string,
): Promise<{ url: string; drop: () => Promise<void> }> {
  const base = process.env.DATABASE_URL;
  if (!base)
    throw new Error(
      'DATABASE_URL is not set: export DATABASE_URL=$(node scripts/db-url.mjs holdfast_test)',
    );
  const name = `${label}_${randomBytes(4).toString('hex')}`;
  const admin = new URL(base);
  admin.pathname = '/postgres';
  const client = new pg.Client({ connectionString: admin.toString() });
  await client.connect();
  await client.query(`create database "${name}"`);
  await client.end();
  const url = new URL(base);
  url.pathname = `/${name}`;
  return {
    url: url.toString(),
    drop: async () => {
      const c = new pg.Client({ connectionString: admin.toString() });
      await c.connect();
      await c.query(`drop database if exists "${name}" with (force)`);
      await c.end();
    },
  };
}
