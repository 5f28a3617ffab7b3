import { Injectable, Logger, type OnModuleDestroy } from '@nestjs/common';
import { Kysely, PostgresDialect } from 'kysely';
import { createPool, databasePlugins, type DB } from '@holdfast/db';
import { AppConfig } from '../config/app-config.js';

/**
 * The application's typed Kysely, injectable anywhere: `constructor(private readonly db: Database)`.
 * Tables and columns are camelCase here (CamelCasePlugin), snake_case in PostgreSQL.
 * Only repositories should use it; they return rows or undefined and throw no HTTP errors.
 */
@Injectable()
export class Database extends Kysely<DB> implements OnModuleDestroy {
  constructor(config: AppConfig) {
    super({
      dialect: new PostgresDialect({
        pool: createPool({
          connectionString: config.settings.DATABASE_URL,
          onIdleError: (error) =>
            new Logger('Database').warn(`idle connection lost: ${error.message}`),
        }),
      }),
      plugins: databasePlugins(),
    });
  }

  async onModuleDestroy(): Promise<void> {
    await this.destroy();
  }
}
