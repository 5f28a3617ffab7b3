import { Injectable } from '@nestjs/common';
import type { Insertable, Updateable } from 'kysely';
import type { DB, RevisionRow } from '@holdfast/db';
import { Database } from '../database/database.js';
import { on, type Tx } from '../database/unit-of-work.js';

/** A revision with the sheet fields every rule needs. */
export type RevisionWithSheet = RevisionRow & {
  ownerId: string;
  sheetType: string;
  documentNumber: string;
  title: string;
};

export type NewRevision = Insertable<DB['revisions']>;
export type RevisionChange = Updateable<DB['revisions']>;

/** The revisions table: reads for the rules, and the writes of saving, the workflow and new issues. */
@Injectable()
export class RevisionsRepository {
  constructor(private readonly db: Database) {}

  /** The revision and its sheet; `lock` takes a row lock on the revision (inside a transaction). */
  async find(id: string, tx?: Tx, lock = false): Promise<RevisionWithSheet | undefined> {
    let q = on(this.db, tx)
      .selectFrom('revisions as r')
      .innerJoin('sheets as s', 's.id', 'r.sheetId')
      .selectAll('r')
      .select(['s.ownerId', 's.sheetType', 's.documentNumber', 's.title'])
      .where('r.id', '=', id);
    if (lock) q = q.forUpdate('r');
    return q.executeTakeFirst();
  }

  listForSheet(sheetId: string, tx?: Tx): Promise<RevisionRow[]> {
    return on(this.db, tx)
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

  /** The sheet's latest revision by sequence; throws when the sheet has none. */
  latestForSheet(sheetId: string, tx?: Tx): Promise<RevisionRow> {
    return on(this.db, tx)
      .selectFrom('revisions')
      .selectAll()
      .where('sheetId', '=', sheetId)
      .orderBy('seq', 'desc')
      .limit(1)
      .executeTakeFirstOrThrow();
  }

  /** The sheet's approved revision, locked until the transaction ends (one approval at a time). */
  approvedForUpdate(sheetId: string, tx: Tx) {
    return on(this.db, tx)
      .selectFrom('revisions')
      .select(['id', 'label', 'rowVersion'])
      .where('sheetId', '=', sheetId)
      .where('state', '=', 'approved')
      .forUpdate()
      .executeTakeFirst();
  }

  /** Comment threads on a revision still open (a reply is part of its thread, not one of its own). */
  async openCommentCount(revisionId: string, tx: Tx): Promise<number> {
    const row = await on(this.db, tx)
      .selectFrom('comments')
      .select((eb) => eb.fn.countAll<string>().as('n'))
      .where('revisionId', '=', revisionId)
      .where('parentId', 'is', null)
      .where('resolved', '=', false)
      .executeTakeFirstOrThrow();
    return Number(row.n);
  }

  /** The latest revision before `seq` that was ever submitted: what a first submission is compared with. */
  previousSubmitted(sheetId: string, seq: number, tx?: Tx) {
    return on(this.db, tx)
      .selectFrom('revisions')
      .select(['label', 'inputs', 'changeNote', 'submittedAt', 'createdAt'])
      .where('sheetId', '=', sheetId)
      .where('seq', '<', seq)
      .where('submittedAt', 'is not', null)
      .orderBy('seq', 'desc')
      .executeTakeFirst();
  }

  async insert(values: NewRevision, tx: Tx): Promise<string> {
    const row = await on(this.db, tx)
      .insertInto('revisions')
      .values(values)
      .returning('id')
      .executeTakeFirstOrThrow();
    return row.id;
  }

  async update(id: string, change: RevisionChange, tx: Tx): Promise<void> {
    await on(this.db, tx).updateTable('revisions').set(change).where('id', '=', id).execute();
  }

  /** The change only when the row is still at `rowVersion` (optimistic concurrency). */
  async updateAtVersion(
    id: string,
    rowVersion: number,
    change: RevisionChange,
    tx: Tx,
  ): Promise<void> {
    await on(this.db, tx)
      .updateTable('revisions')
      .set(change)
      .where('id', '=', id)
      .where('rowVersion', '=', rowVersion)
      .execute();
  }

  /** A comment on the revision (a checker's reason for returning it); its id. */
  async addComment(revisionId: string, authorId: string, body: string, tx: Tx): Promise<string> {
    const row = await on(this.db, tx)
      .insertInto('comments')
      .values({ revisionId, authorId, body })
      .returning('id')
      .executeTakeFirstOrThrow();
    return row.id;
  }

  /** The criteria set the sheet's new revisions start from (a save may choose another). */
  async setSheetCriteriaSet(sheetId: string, criteriaSetId: string, tx: Tx): Promise<void> {
    await on(this.db, tx)
      .updateTable('sheets')
      .set({ criteriaSetId })
      .where('id', '=', sheetId)
      .execute();
  }
}
