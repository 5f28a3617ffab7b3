import { Injectable } from '@nestjs/common';
import type { Comment, CreateCommentInput, UpdateCommentInput } from '@holdfast/shared';
import type { CommentRow } from '@holdfast/db';
import type { AuthUser } from '../auth/auth-user.js';
import { effectiveRoles } from '../auth/policy.js';
import { badRequest, forbidden, notFound } from '../common/errors/api-exception.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import { AuditService } from '../audit/audit.service.js';
import { canComment } from '../revisions/read-rules.js';
import { RevisionsRepository } from '../revisions/revisions.repository.js';
import { RevisionsService } from '../revisions/revisions.service.js';
import { UsersRepository } from '../users/users.repository.js';
import { CommentsRepository } from './comments.repository.js';

type People = Map<string, { id: string; displayName: string; initials: string }>;

function toComment(r: CommentRow, people: People): Comment {
  return {
    id: r.id,
    revisionId: r.revisionId,
    author: people.get(r.authorId) ?? {
      id: r.authorId,
      displayName: 'Unknown user',
      initials: '??',
    },
    body: r.body,
    anchor:
      r.anchorKind && r.anchorKey
        ? { kind: r.anchorKind as 'input' | 'step' | 'check', key: r.anchorKey }
        : null,
    resolved: r.resolved,
    createdAt: r.createdAt.toISOString(),
    parentId: r.parentId,
  };
}

/**
 * Comments on a revision, optionally anchored to an input, a derivation step or a check. Replies
 * hang one level under a comment. Comments are records of the check: never edited or deleted,
 * only resolved.
 */
@Injectable()
export class CommentsService {
  constructor(
    private readonly repo: CommentsRepository,
    private readonly units: UnitOfWork,
    private readonly revisions: RevisionsService,
    private readonly revisionsRepo: RevisionsRepository,
    private readonly users: UsersRepository,
    private readonly audit: AuditService,
  ) {}

  async list(user: AuthUser, revisionId: string): Promise<Comment[]> {
    await this.revisions.load(user, revisionId);
    const rows = await this.repo.listForRevision(revisionId);
    const people = await this.users.people(rows.map((r) => r.authorId));
    const top = rows
      .filter((r) => !r.parentId)
      .map((r) => ({ ...toComment(r, people), replies: [] as Comment[] }));
    const byId = new Map(top.map((c) => [c.id, c]));
    for (const r of rows.filter((x) => x.parentId))
      byId.get(r.parentId!)?.replies.push(toComment(r, people));
    return top;
  }

  async create(user: AuthUser, revisionId: string, input: CreateCommentInput): Promise<Comment> {
    const rev = await this.revisions.load(user, revisionId);
    if (!canComment(user, rev)) {
      throw forbidden(
        `Revision ${rev.label} is ${rev.state}: only a checker or the sheet owner may add to it.`,
      );
    }
    let anchor = input.anchor ?? null;
    if (input.parentId) {
      const parent = await this.repo.find(input.parentId);
      if (!parent || parent.revisionId !== revisionId || parent.parentId) {
        throw badRequest('Some fields are not valid.', [
          { path: 'parentId', message: 'not a top-level comment of this revision' },
        ]);
      }
      anchor = null;
    }
    const row = await this.units.run(async (tx) => {
      const created = await this.repo.insert(
        {
          revisionId,
          parentId: input.parentId ?? null,
          authorId: user.id,
          body: input.body,
          anchorKind: anchor?.kind ?? null,
          anchorKey: anchor?.key ?? null,
        },
        tx,
      );
      await this.audit.record(tx, {
        actorId: user.id,
        action: input.parentId ? 'comment.replied' : 'comment.created',
        entity: 'comment',
        entityId: created.id,
        sheetId: rev.sheetId,
        after: { revision: rev.label, body: input.body, anchor, parentId: input.parentId ?? null },
      });
      return created;
    });
    return toComment(row, await this.users.people([user.id]));
  }

  /** Resolve or reopen: the comment's author, the revision's author, the sheet owner or a checker. */
  async update(user: AuthUser, id: string, input: UpdateCommentInput): Promise<Comment> {
    const row = await this.units.run(async (tx) => {
      const c = await this.repo.find(id, tx, true);
      if (!c) throw notFound('Comment not found.');
      const rev = await this.revisions.load(user, c.revisionId, tx);
      const allowed =
        c.authorId === user.id ||
        rev.authorId === user.id ||
        rev.ownerId === user.id ||
        effectiveRoles(user.role).includes('checker');
      if (!allowed) throw forbidden('Only the people on this revision can resolve its comments.');
      const updated = await this.repo.setResolved(id, input.resolved, user.id, tx);
      await this.audit.record(tx, {
        actorId: user.id,
        action: input.resolved ? 'comment.resolved' : 'comment.reopened',
        entity: 'comment',
        entityId: id,
        sheetId: rev.sheetId,
        before: { resolved: c.resolved },
        after: { resolved: input.resolved },
      });
      return updated;
    });
    return toComment(row, await this.users.people([row.authorId]));
  }
}
