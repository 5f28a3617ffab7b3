import { promises as fs } from 'node:fs';
import path from 'node:path';
import {
  FileMigrationProvider,
  Migrator,
  NO_MIGRATIONS,
  type Kysely,
  type MigrationResult,
} from 'kysely';

import { dbDistDir } from './dist-dir.js';

/** The compiled migrations, `db/dist/migrations`. */
export const migrationFolder = path.join(dbDistDir, 'migrations');

// eslint-disable-next-line @typescript-eslint/no-explicit-any
function migrator(db: Kysely<any>): Migrator {
  return new Migrator({
    db,
    provider: new FileMigrationProvider({ fs, path, migrationFolder }),
  });
}

export class MigrationError extends Error {
  constructor(
    message: string,
    readonly results: readonly MigrationResult[],
    override readonly cause: unknown,
  ) {
    super(message);
    this.name = 'MigrationError';
  }
}

function check(
  outcome: { error?: unknown; results?: MigrationResult[] },
  what: string,
): MigrationResult[] {
  const results = outcome.results ?? [];
  if (outcome.error) {
    const failed = results.find((r) => r.status === 'Error')?.migrationName ?? 'unknown';
    const reason = outcome.error instanceof Error ? outcome.error.message : String(outcome.error);
    throw new MigrationError(`${what} failed at ${failed}: ${reason}`, results, outcome.error);
  }
  return results;
}

/** Apply every pending migration, in name order. Takes a plain (plugin-free) Kysely. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function migrateToLatest(db: Kysely<any>): Promise<MigrationResult[]> {
  return check(await migrator(db).migrateToLatest(), 'migrate to latest');
}

/** Undo every migration, leaving an empty schema (used by tests and `reset`). */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function migrateDownToEmpty(db: Kysely<any>): Promise<MigrationResult[]> {
  return check(await migrator(db).migrateTo(NO_MIGRATIONS), 'migrate down to empty');
}

/** Names of the migration files the provider sees, in order. */
export async function listMigrations(): Promise<string[]> {
  const files = await fs.readdir(migrationFolder);
  return files
    .filter((f) => f.endsWith('.js'))
    .map((f) => f.slice(0, -3))
    .sort();
}
