import { Injectable } from '@nestjs/common';
import { sql } from 'kysely';
import type { QueueItem, WorkQueue } from '@holdfast/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { effectiveRoles } from '../auth/policy.js';
import { Database } from '../database/database.js';

const LIMIT = 50;

@Injectable()
export class WorkQueueService {
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

  private map(
    rows: Awaited<ReturnType<ReturnType<WorkQueueService['base']>['execute']>>,
  ): QueueItem[] {
    return rows.map((r) => ({
      sheetId: r.sheetId,
      documentNumber: r.documentNumber,
      title: r.title,
      revisionId: r.revisionId,
      revisionLabel: r.label,
      state: r.state as QueueItem['state'],
      author: { id: r.authorId, displayName: r.displayName, initials: r.initials },
      updatedAt: r.updatedAt.toISOString(),
    }));
  }

  /**
   * What a viewer acts on is any newly approved sheet (to print into the safety file); an
   * engineer or checker, the approvals of their own work; an administrator, none.
   */
  private recentlyApproved(user: AuthUser) {
    if (user.role === 'admin') return Promise.resolve([]);
    let q = this.base().where('r.state', '=', 'approved');
    if (user.role !== 'viewer')
      q = q.where((eb) =>
        eb.or([
          eb('r.authorId', '=', user.id),
          eb('s.ownerId', '=', user.id),
          eb('r.checkerId', '=', user.id),
        ]),
      );
    return q.orderBy('r.approvedAt', 'desc').limit(10).execute();
  }

  /** Drafts and returned revisions I author or whose sheet I own; checks waiting for me. */
  async forUser(user: AuthUser): Promise<WorkQueue> {
    const mine = (q: ReturnType<WorkQueueService['base']>) =>
      q.where((eb) => eb.or([eb('r.authorId', '=', user.id), eb('s.ownerId', '=', user.id)]));
    const isChecker = effectiveRoles(user.role).includes('checker');
    // Only engineers (and checkers, who are engineers too) author; nobody else has drafts.
    const authors = effectiveRoles(user.role).includes('engineer');
    const [myDrafts, returnedToMe, awaitingMyCheck, recentlyApproved] = await Promise.all([
      authors
        ? mine(this.base()).where('r.state', '=', 'draft').orderBy('r.updatedAt', 'desc').execute()
        : Promise.resolve([]),
      authors
        ? mine(this.base())
            .where('r.state', '=', 'returned')
            .orderBy('r.returnedAt', 'desc')
            .execute()
        : Promise.resolve([]),
      isChecker
        ? this.base()
            .where('r.state', '=', 'in_check')
            .where('r.authorId', '<>', user.id)
            // Four-eyes by person: not the checks of revisions I edited or submitted.
            .where((eb) =>
              eb.not(
                eb(
                  sql<string>`${user.id}::uuid`,
                  '=',
                  eb.fn.any(sql<string[]>`r.editor_ids || r.submitter_ids`),
                ),
              ),
            )
            .orderBy('r.submittedAt', 'asc')
            .execute()
        : Promise.resolve([]),
      this.recentlyApproved(user),
    ]);
    return {
      myDrafts: this.map(myDrafts),
      returnedToMe: this.map(returnedToMe),
      awaitingMyCheck: this.map(awaitingMyCheck),
      recentlyApproved: this.map(recentlyApproved),
    };
  }
}
