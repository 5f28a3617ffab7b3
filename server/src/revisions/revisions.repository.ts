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
}
