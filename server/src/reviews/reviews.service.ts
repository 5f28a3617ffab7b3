import { Injectable, Logger } from '@nestjs/common';
import type { CriteriaSet } from '@holdfast/calc';
import type {
  CriteriaReview,
  ReviewDispositionInput,
  RevisionCriteriaReview,
  UnderReviewQueue,
} from '@holdfast/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { effectiveRoles } from '../auth/policy.js';
import { conflict, forbidden, notFound } from '../common/errors/api-exception.js';
import { AppConfig } from '../config/app-config.js';
import { failingChecks } from '../criteria/failing-checks.js';
import { UnitOfWork, type Tx } from '../database/unit-of-work.js';
import { AuditService } from '../audit/audit.service.js';
import { OutboxService } from '../outbox/outbox.service.js';
import { canReadContent, ownPart } from '../revisions/revision-access.js';
import { underReviewMail } from './review-mail.js';
import { ReviewsRepository, type Person, type ReviewWithSet } from './reviews.repository.js';
import { UsersRepository } from '../users/users.repository.js';

/**
 * Approvals follow criteria changes. Publishing a criteria version re-evaluates every approved
 * revision that uses the set; one that now fails a check it passed when approved is flagged
 * "under review" beside its frozen record, its owner and checker are told, and the flag stays
 * until a newer revision is approved or a checker records why the approval stands.
 */
@Injectable()
export class ReviewsService {
  private readonly logger = new Logger('ReviewsService');

  constructor(
    private readonly units: UnitOfWork,
    private readonly repo: ReviewsRepository,
    private readonly users: UsersRepository,
    private readonly audit: AuditService,
    private readonly outbox: OutboxService,
    private readonly config: AppConfig,
  ) {}

  /** Inside the publish transaction: flag, audit and mail every approval the version fails. */
  async flagAfterPublish(trx: Tx, actorId: string, criteria: CriteriaSet): Promise<number> {
    const approved = await this.repo.approvedUsing(criteria.id, trx);
    let flagged = 0;
    for (const rev of approved) {
      const failing = newlyFailing(
        rev.evaluation,
        failingChecks(rev.sheetType, rev.inputs, criteria, (e) =>
          this.logger.warn(
            `${rev.documentNumber} rev. ${rev.label} no longer evaluates: ${String(e)}`,
          ),
        ),
      );
      if (failing.length === 0) continue;
      flagged++;
      const { id, isNew } = await this.repo.flag(trx, {
        revisionId: rev.id,
        sheetId: rev.sheetId,
        setId: criteria.id,
        version: criteria.version,
        failing,
      });
      await this.audit.record(trx, {
        actorId,
        action: 'revision.under-review',
        entity: 'revision',
        entityId: rev.id,
        sheetId: rev.sheetId,
        after: {
          reviewId: id,
          criteriaSet: `${criteria.id}@${criteria.version}`,
          failing: failing.map((f) => f.id),
          newFlag: isNew,
        },
      });
      const to = await this.users.activeEmails([rev.ownerId, rev.checkerId], trx);
      await this.outbox.enqueueMail(
        trx,
        underReviewMail(
          this.config.settings.PUBLIC_URL,
          {
            sheetId: rev.sheetId,
            revisionId: rev.id,
            documentNumber: rev.documentNumber,
            title: rev.title,
            label: rev.label,
          },
          to,
          { name: criteria.name, version: criteria.version },
          failing,
        ),
      );
    }
    return flagged;
  }

  /** Inside the approval transaction: a newer approval clears the sheet's open flags. */
  async clearOnApproval(
    trx: Tx,
    actorId: string,
    sheetId: string,
    revisionId: string,
    label: string,
  ): Promise<void> {
    for (const c of await this.repo.clearForSheet(trx, sheetId, revisionId)) {
      await this.audit.record(trx, {
        actorId,
        action: 'revision.review-cleared',
        entity: 'revision',
        entityId: c.revisionId,
        sheetId,
        before: { reviewId: c.id, criteriaSet: `${c.criteriaSetId}@${c.criteriaSetVersion}` },
        after: { clearedBy: 'superseded', supersededBy: label },
      });
    }
  }

  async forRevision(user: AuthUser, revisionId: string): Promise<RevisionCriteriaReview> {
    const rev = await this.readable(user, revisionId);
    const [open, cleared] = await Promise.all([
      this.repo.openFor(revisionId),
      this.repo.clearedFor(revisionId),
    ]);
    const people = await this.users.people(cleared.map((c) => c.clearedBy));
    return {
      open: open ? present(open, people) : null,
      cleared: cleared.map((c) => present(c, people)),
      canDispose: !!open && effectiveRoles(user.role).includes('checker') && !ownPart(user.id, rev),
    };
  }

  /** A checker's written disposition clears the open flag; it goes to the audit trail and print. */
  async dispose(
    user: AuthUser,
    revisionId: string,
    input: ReviewDispositionInput,
  ): Promise<RevisionCriteriaReview> {
    const rev = await this.readable(user, revisionId);
    // The same four eyes as approval: whoever wrote, edited or submitted the work does not judge
    // whether it still stands.
    const part = ownPart(user.id, rev);
    if (part)
      throw forbidden(
        `Four eyes: you ${part} revision ${rev.label}; another checker records whether it stands.`,
      );
    await this.units.run(async (tx) => {
      const open = await this.repo.openFor(revisionId, tx);
      if (!open) throw conflict(`Revision ${rev.label} is not under review.`);
      const done = await this.repo.dispose(tx, open.id, user.id, input.disposition);
      if (!done) throw conflict(`The review of revision ${rev.label} was closed meanwhile.`);
      await this.audit.record(tx, {
        actorId: user.id,
        action: 'revision.review-disposed',
        entity: 'revision',
        entityId: revisionId,
        sheetId: rev.sheetId,
        before: {
          reviewId: open.id,
          criteriaSet: `${open.criteriaSetId}@${open.criteriaSetVersion}`,
          flaggedAt: open.flaggedAt.toISOString(),
        },
        after: { disposition: input.disposition },
      });
    });
    return this.forRevision(user, revisionId);
  }

  async queue(user: AuthUser): Promise<UnderReviewQueue> {
    const rows = await this.repo.queueFor(user.id);
    return { items: rows.map((r) => ({ ...r, flaggedAt: r.flaggedAt.toISOString() })) };
  }

  private async readable(user: AuthUser, revisionId: string) {
    const rev = await this.repo.revisionAccess(revisionId);
    if (!rev) throw notFound('Revision not found.');
    if (!canReadContent(user, rev))
      throw forbidden('Only approved revisions are open to your role.');
    return rev;
  }
}

/**
 * The checks failing under the new version that the approved record did not already fail: a
 * check approved as failing (with a justification) was judged then and is no news now.
 */
export function newlyFailing<T extends { id: string }>(stored: unknown, failing: T[]): T[] {
  const checks = (stored as { checks?: { id: string; pass: boolean }[] } | null)?.checks ?? [];
  const failedThen = new Set(checks.filter((c) => !c.pass).map((c) => c.id));
  return failing.filter((f) => !failedThen.has(f.id));
}

function present(r: ReviewWithSet, people: Map<string, Person>): CriteriaReview {
  return {
    id: r.id,
    revisionId: r.revisionId,
    sheetId: r.sheetId,
    criteriaSetId: r.criteriaSetId,
    criteriaSetName: r.criteriaSetName,
    criteriaSetVersion: r.criteriaSetVersion,
    failing: r.failing as CriteriaReview['failing'],
    flaggedAt: r.flaggedAt.toISOString(),
    clearedAt: r.clearedAt?.toISOString() ?? null,
    clearedHow: r.clearedHow,
    clearedBy: r.clearedBy
      ? (people.get(r.clearedBy) ?? {
          id: r.clearedBy,
          displayName: 'Unknown user',
          initials: '??',
        })
      : null,
    disposition: r.disposition,
  };
}
