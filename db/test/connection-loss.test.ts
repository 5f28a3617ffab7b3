import { afterAll, describe, expect, it } from 'vitest';
import pg from 'pg';
import { createPool } from '../src/connection.js';
import { isConnectionError } from '../src/pg-errors.js';

const url = () => {
  const u = process.env.DATABASE_URL;
  if (!u) throw new Error('DATABASE_URL is required');
  return u;
};

async function until(what: () => boolean, ms = 5000) {
  const end = Date.now() + ms;
  while (!what()) {
    if (Date.now() > end) throw new Error('timed out');
    await new Promise((r) => setTimeout(r, 10));
  }
}

/**
 * A connection the server drops (crash, restart, terminate) while the application holds it
 * between two queries, as inside a transaction. Without a listener on the client this is an
 * unhandled 'error' event and the whole process ends.
 */
describe('a pooled connection lost while checked out', () => {
  const admin = new pg.Client({ connectionString: url() });
  afterAll(() => admin.end());

  it('is reported, not thrown, and the pool opens a new connection afterwards', async () => {
    await admin.connect();
    const lost: Error[] = [];
    const pool = createPool({ connectionString: url(), max: 1, onIdleError: (e) => lost.push(e) });
    const client = await pool.connect();
    const { rows } = await client.query<{ pid: number }>('select pg_backend_pid() as pid');
    await client.query('begin');
    await admin.query('select pg_terminate_backend($1)', [rows[0]!.pid]);
    await until(() => lost.length > 0);
    expect(isConnectionError(lost[0])).toBe(true);
    const next = await client.query('select 1').catch((e: unknown) => e);
    expect(isConnectionError(next)).toBe(true);
    client.release();
    const again = await pool.query<{ one: number }>('select 1 as one');
    expect(again.rows[0]!.one).toBe(1);
    await pool.end();
  });
});
