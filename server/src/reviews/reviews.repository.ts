import { Injectable } from '@nestjs/common';
import type { Kysely } from 'kysely';
import type { CriteriaReviewRow, DB } from '@holdfast/db';
import type { FailingCheck } from '../criteria/failing-checks.js';
import { Database } from '../database/database.js';
import { on, type Tx } from '../database/unit-of-work.js';

export type ReviewWithSet = CriteriaReviewRow & { criteriaSetName: string };
export type Person = { id: string; displayName: string; initials: string };

/** All Kysely code of the "under review" flags. */
@Injectable()
export class ReviewsRepository {
  constructor(private readonly db: Database) {}

  private withSet(db: Kysely<DB>) {
    return db
      .selectFrom('criteriaReviews as c')
      .innerJoin('criteriaSets as cs', 'cs.id', 'c.criteriaSetId')
      .selectAll('c')
      .select('cs.name as criteriaSetName');
  }

  /** Approved revisions that use a criteria set: what the impact check, the flag and its mail need. */
  approvedUsing(setId: string, tx?: Tx) {
    return on(this.db, tx)
      .selectFrom('revisions as r')
      .innerJoin('sheets as s', 's.id', 'r.sheetId')
      .select([
        'r.id',
        'r.label',
        'r.inputs',
        'r.evaluation',
        'r.checkerId',
        's.id as sheetId',
        's.ownerId',
        's.sheetType',
        's.documentNumber',
        's.title',
      ])
      .where('r.state', '=', 'approved')
      .where('r.criteriaSetId', '=', setId)
      .orderBy('s.documentNumber')
      .execute();
  }

  openFor(revisionId: string, tx?: Tx): Promise<ReviewWithSet | undefined> {
    return this.withSet(on(this.db, tx))
      .where('c.revisionId', '=', revisionId)
      .where('c.clearedAt', 'is', null)
      .executeTakeFirst();
  }

  clearedFor(revisionId: string, tx?: Tx): Promise<ReviewWithSet[]> {
    return this.withSet(on(this.db, tx))
      .where('c.revisionId', '=', revisionId)
      .where('c.clearedAt', 'is not', null)
      .orderBy('c.clearedAt', 'asc')
      .execute();
  }

  /**
   * Flag (or keep flagged) a revision under a criteria version. A flag already open keeps the date
   * it was first raised and now names the newest version that fails. Returns whether it is new.
   */
  async flag(
    tx: Tx,
    row: {
      revisionId: string;
      sheetId: string;
      setId: string;
      version: number;
      failing: FailingCheck[];
    },
  ): Promise<{ id: string; isNew: boolean }> {
    const trx = on(this.db, tx);
    const open = await trx
      .selectFrom('criteriaReviews')
      .select('id')
      .where('revisionId', '=', row.revisionId)
      .where('clearedAt', 'is', null)
      .forUpdate()
      .executeTakeFirst();
    if (open) {
      await trx
        .updateTable('criteriaReviews')
        .set({ criteriaSetVersion: row.version, failing: JSON.stringify(row.failing) })
        .where('id', '=', open.id)
        .execute();
      return { id: open.id, isNew: false };
    }
    const inserted = await trx
      .insertInto('criteriaReviews')
      .values({
        revisionId: row.revisionId,
        sheetId: row.sheetId,
        criteriaSetId: row.setId,
        criteriaSetVersion: row.version,
        failing: JSON.stringify(row.failing),
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    return { id: inserted.id, isNew: true };
  }

  /** Clear every open flag of the sheet's earlier revisions; returns the cleared flags. */
  clearForSheet(tx: Tx, sheetId: string, exceptRevisionId: string) {
    return on(this.db, tx)
      .updateTable('criteriaReviews')
      .set({ clearedAt: new Date(), clearedHow: 'superseded' })
      .where('sheetId', '=', sheetId)
      .where('revisionId', '<>', exceptRevisionId)
      .where('clearedAt', 'is', null)
      .returning(['id', 'revisionId', 'criteriaSetId', 'criteriaSetVersion'])
      .execute();
  }

  dispose(tx: Tx, id: string, userId: string, disposition: string) {
    return on(this.db, tx)
      .updateTable('criteriaReviews')
      .set({ clearedAt: new Date(), clearedHow: 'disposition', clearedBy: userId, disposition })
      .where('id', '=', id)
      .where('clearedAt', 'is', null)
      .returning(['id', 'clearedAt'])
      .executeTakeFirst();
  }

  /** What deciding who may read a revision needs; undefined when there is no such revision. */
  revisionAccess(revisionId: string) {
    return this.db
      .selectFrom('revisions')
      .select(['id', 'label', 'state', 'sheetId', 'authorId', 'editorIds', 'submitterIds'])
      .where('id', '=', revisionId)
      .executeTakeFirst();
  }

  /** Open flags on sheets I own or revisions I checked. */
  queueFor(userId: string) {
    return this.db
      .selectFrom('criteriaReviews as c')
      .innerJoin('criteriaSets as cs', 'cs.id', 'c.criteriaSetId')
      .innerJoin('revisions as r', 'r.id', 'c.revisionId')
      .innerJoin('sheets as s', 's.id', 'c.sheetId')
      .select([
        's.id as sheetId',
        's.documentNumber',
        's.title',
        'r.id as revisionId',
        'r.label as revisionLabel',
        'cs.name as criteriaSetName',
        'c.criteriaSetVersion',
        'c.flaggedAt',
      ])
      .where('c.clearedAt', 'is', null)
      .where((eb) => eb.or([eb('s.ownerId', '=', userId), eb('r.checkerId', '=', userId)]))
      .orderBy('c.flaggedAt', 'asc')
      .limit(100)
      .execute();
  }
}
