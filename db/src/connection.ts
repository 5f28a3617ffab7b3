import { CamelCasePlugin, Kysely, PostgresDialect } from 'kysely';
import pg from 'pg';
import type { DB } from './database.js';

// pg returns int8 (e.g. count(*)) as a string to avoid precision loss; counts here stay far below
// 2^53, so read them as numbers. numeric keeps pg's default (string).
pg.types.setTypeParser(pg.types.builtins.INT8, (value) => Number(value));

export interface DatabaseOptions {
  connectionString: string;
  /** Pool size; the default suits one server process. */
  max?: number;
  /** Milliseconds to wait for a connection before failing (health checks use a short one). */
  connectionTimeoutMillis?: number;
  /**
   * Told about errors on pooled connections, idle or checked out (they are otherwise ignored).
   * The connection is discarded either way; the next query opens a new one.
   */
  onIdleError?: (error: Error) => void;
}

/** The plugins every application-side Kysely instance uses (see database.ts for naming). */
export function databasePlugins() {
  return [new CamelCasePlugin({ maintainNestedObjectKeys: true })];
}

export function createPool(options: DatabaseOptions): pg.Pool {
  const pool = new pg.Pool({
    connectionString: options.connectionString,
    max: options.max ?? 10,
    connectionTimeoutMillis: options.connectionTimeoutMillis ?? 5000,
  });
  // A connection dropped by the server (restart, crash, admin command) emits 'error' on its
  // client. pg-pool listens only while the client is idle; a client checked out for a
  // transaction, or between two queries, has no listener, and an unhandled 'error' event ends
  // the process. Every client therefore gets its own listener for its whole life. The failed
  // query still rejects (and answers 503); pg-pool drops the dead client on release.
  pool.on('error', (error) => options.onIdleError?.(error));
  pool.on('connect', (client) => {
    client.on('error', (error) => options.onIdleError?.(error));
  });
  return pool;
}

/** A typed, camelCase Kysely instance over a new pool. Call `destroy()` to close it. */
export function createDatabase(options: DatabaseOptions): Kysely<DB> {
  return new Kysely<DB>({
    dialect: new PostgresDialect({ pool: createPool(options) }),
    plugins: databasePlugins(),
  });
}

/** A plain Kysely for migrations: no plugins, snake_case names, `Kysely<any>` by convention. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export function createMigrationDatabase(connectionString: string): Kysely<any> {
  return new Kysely({
    dialect: new PostgresDialect({ pool: createPool({ connectionString, max: 2 }) }),
  });
}
