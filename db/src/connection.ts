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
  /** Told about errors on idle pooled connections (they are otherwise ignored). */
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
  // An idle connection dropped by the server (restart, admin command) must not crash the
  // process; the pool discards it and the next query opens a new one.
  pool.on('error', (error) => options.onIdleError?.(error));
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
