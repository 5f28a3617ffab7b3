import { Injectable } from '@nestjs/common';
import type { SheetInputs } from '@holdfast/calc';
import type {
  ApproveRevisionInput,
  ReturnRevisionInput,
  Revision,
  SubmitRevisionInput,
} from '@holdfast/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { badRequest, conflict, forbidden } from '../common/errors/api-exception.js';
import { AppConfig } from '../config/app-config.js';
import { type Tx, UnitOfWork } from '../database/unit-of-work.js';
import { AuditService } from '../audit/audit.service.js';
import { CriteriaService } from '../criteria/criteria.service.js';
import { OutboxService } from '../outbox/outbox.service.js';
import { ReviewsService } from '../reviews/reviews.service.js';
import { coreVersion, fieldLabel, resolveInputsOf, settingBandsOf } from '../calc/calc-engine.js';
import { evaluateCompleteOrReject } from '../calc/evaluate.js';
import { approvalNoteReason, approvalNoteSummary, failingLabels } from './approval-note.js';
import { approvedMail, returnedMail, submittedMail } from './notifications.js';
import { canCheck, ownPart } from './revision-access.js';
import { contentHash, newVerificationCode } from './revision-codes.js';
import { RevisionsRepository, type RevisionWithSheet } from './revisions.repository.js';
import {
  assertRowVersion,
  RevisionsService,
  snapshot,
  storedUnconfirmed,
  withPerson,
} from './revisions.service.js';
import { UsersRepository } from '../users/users.repository.js';

/**
 * The check-and-approve workflow: draft/returned → in check → approved (previous approved →
 * superseded) or returned. Each step runs in one transaction with its audit event and its
 * notification (outbox), so either all of it happens or none.
 */
@Injectable()
export class WorkflowService {
  constructor(
    private readonly units: UnitOfWork,
    private readonly repo: RevisionsRepository,
    private readonly users: UsersRepository,
    private readonly revisions: RevisionsService,
    private readonly criteria: CriteriaService,
    private readonly audit: AuditService,
    private readonly outbox: OutboxService,
    private readonly config: AppConfig,
    private readonly reviews: ReviewsService,
  ) {}

  private about(rev: RevisionWithSheet) {
    return {
      sheetId: rev.sheetId,
      revisionId: rev.id,
      documentNumber: rev.documentNumber,
      title: rev.title,
      label: rev.label,
    };
  }

  /** Validate and evaluate on the server, freeze, hash, and ask the checkers. */
  async submit(user: AuthUser, id: string, input: SubmitRevisionInput): Promise<Revision> {
    await this.units.run(async (tx) => {
      const rev = await this.revisions.load(user, id, tx, true);
      this.revisions.assertEditable(user, rev, input.rowVersion);
      const unconfirmed = storedUnconfirmed(rev);
      if (unconfirmed.length > 0) {
        throw badRequest(
          `${unconfirmed.length} value(s) came with the sheet and were never confirmed: enter this brake's value or confirm each one.`,
          unconfirmed.map((k) => ({
            path: `inputs.${k}`,
            message: `not confirmed: ${fieldLabel(rev.sheetType, k)}`,
          })),
        );
      }
      const criteria = await this.criteria.load(rev.criteriaSetId, 'latest', tx);
      const inputs = rev.inputs as SheetInputs;
      // The frozen record keeps the inputs exactly as the core used them, beside its results.
      const evaluated = evaluateCompleteOrReject(rev.sheetType, inputs, criteria);
      const evaluation = {
        ...evaluated,
        resolvedInputs: resolveInputsOf(rev.sheetType, inputs),
        settingBands: settingBandsOf(rev.sheetType, inputs, criteria, evaluated),
      };
      const failing = evaluation.checks.filter((c) => !c.pass);
      const justification = input.justification?.trim() || null;
      if (failing.length > 0 && !justification) {
        throw badRequest('Some checks fail: say why this revision should still be checked.', [
          {
            path: 'justification',
            message: `required because ${failing.length} check(s) fail: ${failing.map((c) => c.label).join(', ')}`,
          },
        ]);
      }
      const hash = contentHash(rev.inputs, evaluation);
      const after = {
        state: 'in_check',
        rowVersion: rev.rowVersion + 1,
        evaluation: JSON.stringify(evaluation),
        criteriaSetVersion: criteria.version,
        coreVersion: coreVersion(),
        hash,
        verificationCode: newVerificationCode(hash),
        justification,
        submittedAt: new Date(),
        submitterIds: withPerson(rev.submitterIds, user.id),
      };
      await this.repo.update(id, after, tx);
      await this.audit.record(tx, {
        actorId: user.id,
        action: 'revision.submitted',
        entity: 'revision',
        entityId: id,
        sheetId: rev.sheetId,
        before: snapshot(rev),
        after: {
          state: 'in_check',
          rowVersion: after.rowVersion,
          hash,
          coreVersion: after.coreVersion,
          criteriaSet: `${rev.criteriaSetId}@${criteria.version}`,
          pass: evaluation.pass,
          failing: failing.map((c) => c.id),
          justification,
        },
      });
      const to = await this.users.checkerEmails(rev.authorId, tx);
      await this.outbox.enqueueMail(
        tx,
        submittedMail(
          this.config.settings.PUBLIC_URL,
          this.about(rev),
          to,
          user.displayName,
          failing.length,
        ),
      );
    });
    return this.revisions.get(user, id);
  }

  private async loadForCheck(user: AuthUser, id: string, rowVersion: number, tx: Tx) {
    const rev = await this.revisions.load(user, id, tx, true);
    if (rev.state !== 'in_check') {
      throw conflict(`Revision ${rev.label} is ${rev.state.replace('_', ' ')}, not in check.`, {
        state: rev.state,
        currentRowVersion: rev.rowVersion,
      });
    }
    const own = ownPart(user.id, rev);
    if (own)
      throw forbidden(
        `Four eyes: you ${own} revision ${rev.label}, and nobody checks their own revision: ask another checker.`,
      );
    if (!canCheck(user, rev)) throw forbidden('Only a checker can approve or return a revision.');
    assertRowVersion(rev, rowVersion);
    return rev;
  }

  async approve(user: AuthUser, id: string, input: ApproveRevisionInput): Promise<Revision> {
    await this.units.run(async (tx) => {
      const rev = await this.loadForCheck(user, id, input.rowVersion, tx);
      // An open comment stays open on the approved record for good, and a failing check is
      // signed as it is: either way the checker says in the approval note why it is approved.
      const open = await this.repo.openCommentCount(id, tx);
      const failing = failingLabels(rev.evaluation);
      if ((open > 0 || failing.length > 0) && !input.note?.trim()) {
        throw badRequest(approvalNoteSummary(open, failing), [
          { path: 'note', message: approvalNoteReason(open, failing) },
        ]);
      }
      const now = new Date();
      const previous = await this.repo.approvedForUpdate(rev.sheetId, tx);
      if (previous) {
        await this.repo.update(
          previous.id,
          {
            state: 'superseded',
            supersededAt: now,
            supersededById: id,
            rowVersion: previous.rowVersion + 1,
          },
          tx,
        );
        await this.audit.record(tx, {
          actorId: user.id,
          action: 'revision.superseded',
          entity: 'revision',
          entityId: previous.id,
          sheetId: rev.sheetId,
          before: { state: 'approved', label: previous.label },
          after: { state: 'superseded', supersededBy: rev.label },
        });
      }
      await this.repo.update(
        id,
        {
          state: 'approved',
          checkerId: user.id,
          approvedAt: now,
          checkNote: input.note?.trim() || null,
          rowVersion: rev.rowVersion + 1,
        },
        tx,
      );
      await this.reviews.clearOnApproval(tx, user.id, rev.sheetId, id, rev.label);
      await this.audit.record(tx, {
        actorId: user.id,
        action: 'revision.approved',
        entity: 'revision',
        entityId: id,
        sheetId: rev.sheetId,
        before: { state: rev.state, rowVersion: rev.rowVersion },
        after: {
          state: 'approved',
          rowVersion: rev.rowVersion + 1,
          hash: rev.hash,
          note: input.note ?? null,
        },
      });
      const [to] = await this.users.activeEmails([rev.authorId], tx);
      await this.outbox.enqueueMail(
        tx,
        approvedMail(
          this.config.settings.PUBLIC_URL,
          this.about(rev),
          to ? [to] : [],
          user.displayName,
        ),
      );
    });
    return this.revisions.get(user, id);
  }

  /** Back to the author; the reason is stored as a comment on the revision. */
  async return(user: AuthUser, id: string, input: ReturnRevisionInput): Promise<Revision> {
    await this.units.run(async (tx) => {
      const rev = await this.loadForCheck(user, id, input.rowVersion, tx);
      await this.repo.update(
        id,
        {
          state: 'returned',
          checkerId: user.id,
          returnedAt: new Date(),
          rowVersion: rev.rowVersion + 1,
        },
        tx,
      );
      const commentId = await this.repo.addComment(id, user.id, input.comment, tx);
      await this.audit.record(tx, {
        actorId: user.id,
        action: 'revision.returned',
        entity: 'revision',
        entityId: id,
        sheetId: rev.sheetId,
        before: { state: rev.state, rowVersion: rev.rowVersion },
        after: {
          state: 'returned',
          rowVersion: rev.rowVersion + 1,
          commentId,
          comment: input.comment,
        },
      });
      const [to] = await this.users.activeEmails([rev.authorId], tx);
      await this.outbox.enqueueMail(
        tx,
        returnedMail(
          this.config.settings.PUBLIC_URL,
          this.about(rev),
          to ? [to] : [],
          user.displayName,
          input.comment,
        ),
      );
    });
    return this.revisions.get(user, id);
  }
}
