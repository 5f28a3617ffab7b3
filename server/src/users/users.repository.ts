import { Injectable } from '@nestjs/common';
import type { NewUserRow, UserRow, UserRowUpdate } from '@holdfast/db';
import { Database } from '../database/database.js';

@Injectable()
export class UsersRepository {
  constructor(private readonly db: Database) {}

  findById(id: string): Promise<UserRow | undefined> {
    return this.db.selectFrom('users').selectAll().where('id', '=', id).executeTakeFirst();
  }

  findByEmail(email: string): Promise<UserRow | undefined> {
    return this.db
      .selectFrom('users')
      .selectAll()
      .where('email', '=', email.toLowerCase())
      .executeTakeFirst();
  }

  list(): Promise<UserRow[]> {
    return this.db
      .selectFrom('users')
      .selectAll()
      .orderBy('displayName')
      .orderBy('email')
      .execute();
  }

  insert(row: NewUserRow): Promise<UserRow> {
    return this.db.insertInto('users').values(row).returningAll().executeTakeFirstOrThrow();
  }

  update(id: string, patch: UserRowUpdate): Promise<UserRow | undefined> {
    return this.db
      .updateTable('users')
      .set(patch)
      .where('id', '=', id)
      .returningAll()
      .executeTakeFirst();
  }

  /** Ends every session of a user (on deactivation). */
  async revokeSessions(userId: string): Promise<void> {
    await this.db
      .updateTable('refreshTokens')
      .set({ revokedAt: new Date() })
      .where('userId', '=', userId)
      .where('revokedAt', 'is', null)
      .execute();
  }
}
