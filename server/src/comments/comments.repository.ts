import { Injectable } from '@nestjs/common';
import type { CommentRow } from '@holdfast/db';
import { Database } from '../database/database.js';
import { on, type Tx } from '../database/unit-of-work.js';

export interface NewComment {
  revisionId: string;
  parentId: string | null;
  authorId: string;
  body: string;
  anchorKind: string | null;
  anchorKey: string | null;
}

/** Comments on revisions: written once, then only resolved or reopened. */
@Injectable()
export class CommentsRepository {
  constructor(private readonly db: Database) {}

  /** Every comment and reply of the revision, oldest first (id breaks ties). */
  listForRevision(revisionId: string): Promise<CommentRow[]> {
    return this.db
      .selectFrom('comments')
      .selectAll()
      .where('revisionId', '=', revisionId)
      .orderBy('createdAt', 'asc')
      .orderBy('id', 'asc')
      .execute();
  }

  /** The comment; `lock` takes its row lock (inside the caller's transaction). */
  find(id: string, tx?: Tx, lock = false): Promise<CommentRow | undefined> {
    let q = on(this.db, tx).selectFrom('comments').selectAll().where('id', '=', id);
    if (lock) q = q.forUpdate();
    return q.executeTakeFirst();
  }

  insert(row: NewComment, tx?: Tx): Promise<CommentRow> {
    return on(this.db, tx)
      .insertInto('comments')
      .values(row)
      .returningAll()
      .executeTakeFirstOrThrow();
  }

  /** Resolves (by `userId`) or reopens the comment; returns it as it now stands. */
  setResolved(id: string, resolved: boolean, userId: string, tx?: Tx): Promise<CommentRow> {
    return on(this.db, tx)
      .updateTable('comments')
      .set({
        resolved,
        resolvedBy: resolved ? userId : null,
        resolvedAt: resolved ? new Date() : null,
      })
      .where('id', '=', id)
      .returningAll()
      .executeTakeFirstOrThrow();
  }
}
