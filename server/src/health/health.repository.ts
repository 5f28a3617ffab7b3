import { Injectable } from '@nestjs/common';
import { isConnectionError } from '@holdfast/db';
import { sql } from 'kysely';
import { Database } from '../database/database.js';

/** Stale pooled connections tried before the check reports the database down. */
const PING_ATTEMPTS = 3;

/** The health check's one query. */
@Injectable()
export class HealthRepository {
  constructor(private readonly db: Database) {}

  /**
   * Resolves when PostgreSQL answers `select 1`; rejects when it cannot. After a restart the pool
   * may still hold connections the server closed: one fails, the pool drops it, and the next try
   * takes another. So a connection error is tried again (the caller bounds the time), and the
   * check reports the database, not a stale socket.
   */
  async ping(): Promise<void> {
    for (let attempt = 1; ; attempt++) {
      try {
        await sql`select 1`.execute(this.db);
        return;
      } catch (e) {
        if (!isConnectionError(e) || attempt >= PING_ATTEMPTS) throw e;
      }
    }
  }
}
