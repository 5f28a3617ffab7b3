import { Injectable } from '@nestjs/common';
import { sql } from 'kysely';
import { Database } from '../database/database.js';

/** The health check's one query. */
@Injectable()
export class HealthRepository {
  constructor(private readonly db: Database) {}

  /** Resolves when PostgreSQL answers `select 1`; rejects when it cannot. */
  async ping(): Promise<void> {
    await sql`select 1`.execute(this.db);
  }
}
