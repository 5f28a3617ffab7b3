import { Injectable } from '@nestjs/common';
import type { Kysely } from 'kysely';
import type { DB, RevisionRow } from '@holdfast/db';
import { Database } from '../database/database.js';

/** A revision with the sheet fields every rule needs. */
export type RevisionWithSheet = RevisionRow & {
  ownerId: string;
  sheetType: string;
  documentNumber: string;
  title: string;
};

@Injectable()
export class RevisionsRepository {
  constructor(private readonly db: Database) {}

  /** The revision and its sheet; `lock` takes a row lock on the revision (inside a transaction). */
  async find(
    id: string,
    db: Kysely<DB> = this.db,
    lock = false,
  ): Promise<RevisionWithSheet | undefined> {
    let q = db
      .selectFrom('revisions as r')
      .innerJoin('sheets as s', 's.id', 'r.sheetId')
      .selectAll('r')
      .select(['s.ownerId', 's.sheetType', 's.documentNumber', 's.title'])
      .where('r.id', '=', id);
    if (lock) q = q.forUpdate('r');
    return q.executeTakeFirst();
  }

  listForSheet(sheetId: string, db: Kysely<DB> = this.db): Promise<RevisionRow[]> {
    return db
      .selectFrom('revisions')
      .selectAll()
      .where('sheetId', '=', sheetId)
      .orderBy('seq', 'asc')
      .execute();
  }

  /** Label of the revision that superseded this one. */
  async label(id: string): Promise<string | undefined> {
    const row = await this.db
      .selectFrom('revisions')
      .select('label')
      .where('id', '=', id)
      .executeTakeFirst();
    return row?.label;
  }

  /** Users by id, for person references. */
  async people(ids: (string | null | undefined)[], db: Kysely<DB> = this.db) {
    const wanted = [...new Set(ids.filter((x): x is string => !!x))];
    if (wanted.length === 0)
      return new Map<string, { id: string; displayName: string; initials: string }>();
    const rows = await db
      .selectFrom('users')
      .select(['id', 'displayName', 'initials'])
      .where('id', 'in', wanted)
      .execute();
    return new Map(rows.map((r) => [r.id, r]));
  }

  /** E-mail addresses of active checkers other than `exceptId`. */
  async checkerEmails(exceptId: string, db: Kysely<DB> = this.db): Promise<string[]> {
    const rows = await db
      .selectFrom('users')
      .select('email')
      .where('role', '=', 'checker')
      .where('active', '=', true)
      .where('id', '<>', exceptId)
      .orderBy('email')
      .execute();
    return rows.map((r) => r.email);
  }

  async email(userId: string, db: Kysely<DB> = this.db): Promise<string | undefined> {
    const row = await db
      .selectFrom('users')
      .select(['email', 'active'])
      .where('id', '=', userId)
      .executeTakeFirst();
    return row?.active ? row.email : undefined;
  }
}
