import { Injectable, Logger, type OnModuleDestroy } from '@nestjs/common';
import { createHash } from 'node:crypto';
import { Kysely, PostgresDialect, type CompiledQuery } from 'kysely';
import type pg from 'pg';
import { createPool, databasePlugins, type DB } from '@holdfast/db';
import { AppConfig } from '../config/app-config.js';

/**
 * The application's typed Kysely, injectable anywhere: `constructor(private readonly db: Database)`.
 * Tables and columns are camelCase here (CamelCasePlugin), snake_case in PostgreSQL.
 * Only repositories should use it; they return rows or undefined and throw no HTTP errors.
 */
@Injectable()
export class Database extends Kysely<DB> implements OnModuleDestroy {
  private readonly pool: pg.Pool;

  constructor(config: AppConfig) {
    const pool = createPool({
      connectionString: config.settings.DATABASE_URL,
      onIdleError: (error) => new Logger('Database').warn(`idle connection lost: ${error.message}`),
    });
    super({ dialect: new PostgresDialect({ pool }), plugins: databasePlugins() });
    this.pool = pool;
  }

  /**
   * Runs a compiled query as a named prepared statement: each connection parses and plans it
   * once, and after a few runs PostgreSQL keeps a generic plan. For hot reads whose planning
   * costs more than their execution (the sheet list). Rows come back as PostgreSQL names them
   * (no camelCase mapping), so alias the columns as they should be read.
   */
  async executePrepared<R>(query: CompiledQuery): Promise<R[]> {
    const name = 'hf_' + createHash('sha1').update(query.sql).digest('base64url');
    const result = await this.pool.query<R & pg.QueryResultRow>({
      name,
      text: query.sql,
      values: [...query.parameters],
    });
    return result.rows;
  }

  async onModuleDestroy(): Promise<void> {
    await this.destroy();
  }
}
