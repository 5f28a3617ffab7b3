import { Injectable } from '@nestjs/common';
import type { NewUserRow, UserRow, UserRowUpdate } from '@holdfast/db';
import { Database } from '../database/database.js';
import { on, type Tx } from '../database/unit-of-work.js';
import { SignedInUsers } from './signed-in-users.js';

@Injectable()
export class UsersRepository {
  constructor(
    private readonly db: Database,
    private readonly signedIn: SignedInUsers,
  ) {}

  findById(id: string, tx?: Tx): Promise<UserRow | undefined> {
    return on(this.db, tx).selectFrom('users').selectAll().where('id', '=', id).executeTakeFirst();
  }

  findByEmail(email: string): Promise<UserRow | undefined> {
    return this.db
      .selectFrom('users')
      .selectAll()
      .where('email', '=', email.toLowerCase())
      .executeTakeFirst();
  }

  /** Users by id (name and initials), for person references. */
  async people(ids: (string | null | undefined)[], tx?: Tx) {
    const wanted = [...new Set(ids.filter((x): x is string => !!x))];
    if (wanted.length === 0)
      return new Map<string, { id: string; displayName: string; initials: string }>();
    const rows = await on(this.db, tx)
      .selectFrom('users')
      .select(['id', 'displayName', 'initials'])
      .where('id', 'in', wanted)
      .execute();
    return new Map(rows.map((r) => [r.id, r]));
  }

  /** E-mail addresses of the active users among `ids`, sorted; inactive ones get no mail. */
  async activeEmails(ids: (string | null)[], tx?: Tx): Promise<string[]> {
    const wanted = [...new Set(ids.filter((x): x is string => !!x))];
    if (wanted.length === 0) return [];
    const rows = await on(this.db, tx)
      .selectFrom('users')
      .select('email')
      .where('id', 'in', wanted)
      .where('active', '=', true)
      .orderBy('email')
      .execute();
    return rows.map((r) => r.email);
  }

  /** E-mail addresses of active checkers other than `exceptId`. */
  async checkerEmails(exceptId: string, tx?: Tx): Promise<string[]> {
    const rows = await on(this.db, tx)
      .selectFrom('users')
      .select('email')
      .where('role', '=', 'checker')
      .where('active', '=', true)
      .where('id', '<>', exceptId)
      .orderBy('email')
      .execute();
    return rows.map((r) => r.email);
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
    this.signedIn.forget(id);
    return this.db
      .updateTable('users')
      .set(patch)
      .where('id', '=', id)
      .returningAll()
      .executeTakeFirst();
  }

  /**
   * Ends the user's access tokens at once: each carries the session version it was issued
   * under, and the guard refuses older ones. Refresh tokens are untouched (see revokeSessions).
   */
  async endAccessTokens(userId: string, tx?: Tx): Promise<void> {
    this.signedIn.forget(userId);
    await on(this.db, tx)
      .updateTable('users')
      .set((eb) => ({ sessionVersion: eb('sessionVersion', '+', 1) }))
      .where('id', '=', userId)
      .execute();
  }

  /** A new password hash; ends every session (access and refresh) of the user. */
  async setPassword(userId: string, passwordHash: string, tx?: Tx): Promise<void> {
    this.signedIn.forget(userId);
    await on(this.db, tx)
      .updateTable('users')
      .set({ passwordHash })
      .where('id', '=', userId)
      .execute();
    await this.endAccessTokens(userId, tx);
    await this.revokeSessions(userId, tx);
  }

  /** Ends every session of a user (on deactivation). */
  async revokeSessions(userId: string, tx?: Tx): Promise<void> {
    await on(this.db, tx)
      .updateTable('refreshTokens')
      .set({ revokedAt: new Date() })
      .where('userId', '=', userId)
      .where('revokedAt', 'is', null)
      .execute();
  }
}
