import { Injectable } from '@nestjs/common';
import type { RefreshTokenRow } from '@holdfast/db';
import { Database } from '../database/database.js';
import { on, type Tx } from '../database/unit-of-work.js';

@Injectable()
export class RefreshTokensRepository {
  constructor(private readonly db: Database) {}

  async insert(
    row: { userId: string; tokenHash: string; expiresAt: Date; rotatedFrom?: string },
    tx?: Tx,
  ): Promise<void> {
    await on(this.db, tx).insertInto('refreshTokens').values(row).execute();
  }

  findByHash(tokenHash: string): Promise<RefreshTokenRow | undefined> {
    return this.db
      .selectFrom('refreshTokens')
      .selectAll()
      .where('tokenHash', '=', tokenHash)
      .executeTakeFirst();
  }

  /**
   * Revokes the token if it is still live; returns false when another request got there first,
   * which makes rotation single-use even under concurrent refreshes.
   */
  async revokeIfLive(id: string, tx?: Tx): Promise<boolean> {
    const result = await on(this.db, tx)
      .updateTable('refreshTokens')
      .set({ revokedAt: new Date() })
      .where('id', '=', id)
      .where('revokedAt', 'is', null)
      .executeTakeFirst();
    return result.numUpdatedRows > 0n;
  }

  async revokeAllForUser(userId: string): Promise<void> {
    await this.db
      .updateTable('refreshTokens')
      .set({ revokedAt: new Date() })
      .where('userId', '=', userId)
      .where('revokedAt', 'is', null)
      .execute();
  }

  async wasRotated(id: string): Promise<boolean> {
    const next = await this.db
      .selectFrom('refreshTokens')
      .select('id')
      .where('rotatedFrom', '=', id)
      .executeTakeFirst();
    return next !== undefined;
  }
}
