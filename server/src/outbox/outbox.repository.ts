import { Injectable } from '@nestjs/common';
import type { Selectable } from 'kysely';
import type { DB } from '@holdfast/db';
import { Database } from '../database/database.js';
import { on, type Tx } from '../database/unit-of-work.js';

export type OutboxRow = Selectable<DB['outbox']>;

/** The outbox table: messages written with the change that caused them, marked when sent. */
@Injectable()
export class OutboxRepository {
  constructor(private readonly db: Database) {}

  /** A new mail row inside the caller's transaction; returns its id. */
  async insertMail(payload: string, tx: Tx): Promise<string> {
    const row = await on(this.db, tx)
      .insertInto('outbox')
      .values({ kind: 'mail', payload })
      .returning('id')
      .executeTakeFirstOrThrow();
    return row.id;
  }

  find(id: string): Promise<OutboxRow | undefined> {
    return this.db.selectFrom('outbox').selectAll().where('id', '=', id).executeTakeFirst();
  }

  /** One more attempt that failed, with its reason. */
  async recordFailure(id: string, reason: string): Promise<void> {
    await this.db
      .updateTable('outbox')
      .set((eb) => ({ attempts: eb('attempts', '+', 1), lastError: reason }))
      .where('id', '=', id)
      .execute();
  }

  /** The attempt that delivered it; `payload` replaces the stored one when given. */
  async recordSent(id: string, payload?: string): Promise<void> {
    await this.db
      .updateTable('outbox')
      .set((eb) => ({
        attempts: eb('attempts', '+', 1),
        sentAt: new Date(),
        lastError: null,
        ...(payload !== undefined ? { payload } : {}),
      }))
      .where('id', '=', id)
      .execute();
  }

  /** Unsent rows tried more than `retryLimit` times, newest first, at most 200. */
  failed(retryLimit: number): Promise<OutboxRow[]> {
    return this.db
      .selectFrom('outbox')
      .selectAll()
      .where('sentAt', 'is', null)
      .where('attempts', '>', retryLimit)
      .orderBy('createdAt', 'desc')
      .limit(200)
      .execute();
  }

  /** Gives a failed row a fresh count of attempts; false when it is not (or no longer) failed. */
  async resetFailed(id: string, retryLimit: number, tx?: Tx): Promise<boolean> {
    const reset = await on(this.db, tx)
      .updateTable('outbox')
      .set({ attempts: 0, lastError: null })
      .where('id', '=', id)
      .where('sentAt', 'is', null)
      .where('attempts', '>', retryLimit)
      .executeTakeFirst();
    return reset.numUpdatedRows > 0n;
  }
}
