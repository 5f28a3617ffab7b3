import { Injectable } from '@nestjs/common';
import type { PasswordResetRow } from '@holdfast/db';
import { Database } from '../database/database.js';
import { on, type Tx } from '../database/unit-of-work.js';

/** One-time password reset links, kept by the SHA-256 of their token. */
@Injectable()
export class PasswordResetsRepository {
  constructor(private readonly db: Database) {}

  /** Marks every unused link of the user used, so only the newest one works. */
  async closeOpen(userId: string, tx?: Tx): Promise<void> {
    await on(this.db, tx)
      .updateTable('passwordResets')
      .set({ usedAt: new Date() })
      .where('userId', '=', userId)
      .where('usedAt', 'is', null)
      .execute();
  }

  async insert(
    row: { userId: string; tokenHash: string; requestedBy: string; expiresAt: Date },
    tx?: Tx,
  ): Promise<void> {
    await on(this.db, tx).insertInto('passwordResets').values(row).execute();
  }

  findByHash(tokenHash: string): Promise<PasswordResetRow | undefined> {
    return this.db
      .selectFrom('passwordResets')
      .selectAll()
      .where('tokenHash', '=', tokenHash)
      .executeTakeFirst();
  }

  /** Uses the link; false when it was used already (a second, concurrent use loses). */
  async markUsed(id: string, tx?: Tx): Promise<boolean> {
    const used = await on(this.db, tx)
      .updateTable('passwordResets')
      .set({ usedAt: new Date() })
      .where('id', '=', id)
      .where('usedAt', 'is', null)
      .executeTakeFirst();
    return used.numUpdatedRows > 0n;
  }
}
