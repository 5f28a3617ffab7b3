import { Injectable } from '@nestjs/common';
import { sql } from 'kysely';
import { Database } from '../database/database.js';

const LIMIT = 50;

/** The revisions a work queue lists, with sheet and author; at most 50 per list. */
@Injectable()
export class WorkQueueRepository {
  constructor(private readonly db: Database) {}

  private base() {
    return this.db
      .selectFrom('revisions as r')
      .innerJoin('sheets as s', 's.id', 'r.sheetId')
      .innerJoin('users as a', 'a.id', 'r.authorId')
      .select([
        's.id as sheetId',
        's.documentNumber',
        's.title',
        'r.id as revisionId',
        'r.label',
        'r.state',
        'r.updatedAt',
        'a.id as authorId',
        'a.displayName',
        'a.initials',
      ])
      .limit(LIMIT);
  }

  private mine(userId: string) {
    return this.base().where((eb) =>
      eb.or([eb('r.authorId', '=', userId), eb('s.ownerId', '=', userId)]),
    );
  }

  /** Drafts the user authors or whose sheet the user owns, latest first. */
  drafts(userId: string) {
    return this.mine(userId)
      .where('r.state', '=', 'draft')
      .orderBy('r.updatedAt', 'desc')
      .execute();
  }

  /** Returned revisions the user authors or whose sheet the user owns, latest first. */
  returned(userId: string) {
    return this.mine(userId)
      .where('r.state', '=', 'returned')
      .orderBy('r.returnedAt', 'desc')
      .execute();
  }

  /**
   * Revisions in check that the user may check, oldest first: four-eyes by person, so not
   * those the user wrote, edited or submitted.
   */
  awaitingCheckBy(userId: string) {
    return this.base()
      .where('r.state', '=', 'in_check')
      .where('r.authorId', '<>', userId)
      .where((eb) =>
        eb.not(
          eb(
            sql<string>`${userId}::uuid`,
            '=',
            eb.fn.any(sql<string[]>`r.editor_ids || r.submitter_ids`),
          ),
        ),
      )
      .orderBy('r.submittedAt', 'asc')
      .execute();
  }

  /** The ten latest approvals: all of them, or those the user wrote, owns or checked. */
  recentlyApproved(involving?: string) {
    let q = this.base().where('r.state', '=', 'approved');
    if (involving)
      q = q.where((eb) =>
        eb.or([
          eb('r.authorId', '=', involving),
          eb('s.ownerId', '=', involving),
          eb('r.checkerId', '=', involving),
        ]),
      );
    return q.orderBy('r.approvedAt', 'desc').limit(10).execute();
  }
}

export type QueueRow = Awaited<ReturnType<WorkQueueRepository['drafts']>>[number];
