import { Injectable } from '@nestjs/common';
import type { FieldIssue, FieldRecord, FieldRecordVerify } from '@holdfast/shared';
import { fieldCheckKeys, mayCountersign } from '@holdfast/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { AuditService } from '../audit/audit.service.js';
import { conflict, forbidden, notFound } from '../common/errors/api-exception.js';
import { AppConfig } from '../config/app-config.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import { OutboxService } from '../outbox/outbox.service.js';
import { newVerificationCode } from '../revisions/revision-codes.js';
import { checkLabels, outOfToleranceAsLeft } from '../calc/field-targets.js';
import { NO_PLACE, toFieldRecord } from './field-record-mapper.js';
import { FieldRecordsRepository } from './field-records.repository.js';
import { FieldRecordSigningRepository } from './field-record-signing.repository.js';
import { FieldRecordsService, invalid, lockOwnDraft } from './field-records.service.js';
import { outOfToleranceMail } from './field-notifications.js';

/**
 * A signature says every check item was looked at: each needs an answer (OK, not OK or N/A)
 * before signing, though a draft may hold only some. The form asks the same; this is the rule.
 */
function unansweredChecks(sheetType: string, checks: FieldRecord['checks']): FieldIssue[] {
  const answered = new Set(checks.map((c) => c.key));
  const labels = checkLabels(sheetType);
  return fieldCheckKeys
    .filter((key) => !answered.has(key))
    .map((key) => ({
      path: `checks.${key}`,
      message: `${labels[key]}: not answered; answer every check before signing`,
    }));
}

/**
 * Signatures on field records: the maker signs a complete draft (every check answered, a reason
 * for every as-left value outside its tolerance, and signing one of those tells the sheet's owner
 * and the plant engineers); a plant engineer (engineer or checker) who neither made nor signed it
 * countersigns. A signed record answers to its printed verification code.
 */
@Injectable()
export class FieldRecordSigningService {
  constructor(
    private readonly units: UnitOfWork,
    private readonly repo: FieldRecordsRepository,
    private readonly signing: FieldRecordSigningRepository,
    private readonly records: FieldRecordsService,
    private readonly audit: AuditService,
    private readonly outbox: OutboxService,
    private readonly config: AppConfig,
  ) {}

  async sign(user: AuthUser, id: string): Promise<FieldRecord> {
    await this.units.run(async (tx) => {
      const row = await lockOwnDraft(this.repo, tx, user, id);
      const stored = (await this.repo.load(id, tx))!;
      const rev = (await this.repo.revision(row.revisionId, tx))!;
      const record = toFieldRecord(stored, rev, NO_PLACE, new Map());
      const out = outOfToleranceAsLeft(record.measurements);
      const missing = out.filter((i) => record.measurements[i]!.reason.trim() === '');
      const issues: FieldIssue[] = [
        ...missing.map((i) => ({
          path: `measurements.${i}.reason`,
          message: 'as left is outside the tolerance: give the reason before signing',
        })),
        ...unansweredChecks(rev.sheetType, record.checks),
      ];
      if (issues.length > 0) throw invalid(issues);
      // The judgement the technician signs is stored with the measurements, while the record is
      // still a draft: from here on the database refuses to change it, and reads use it.
      await this.repo.replaceMeasurements(tx, id, record.measurements);
      let code = newVerificationCode(id);
      while (await this.signing.verificationCodeTaken(code, tx)) code = newVerificationCode(id);
      await this.repo.update(tx, id, {
        status: 'signed',
        verificationCode: code,
        outOfTolerance: out.length > 0,
      });
      await this.signing.addSignature(
        {
          recordId: id,
          kind: 'technician',
          userId: user.id,
          displayName: user.displayName,
          initials: user.initials,
        },
        tx,
      );
      await this.audit.record(tx, {
        actorId: user.id,
        action: 'field-record.signed',
        entity: 'field-record',
        entityId: id,
        sheetId: rev.sheetId,
        after: { status: 'signed', outOfTolerance: out.length },
      });
      if (out.length > 0) {
        const place = (await this.repo.positionPlace(row.positionId, tx)) ?? NO_PLACE;
        const lines = out.map((i) => {
          const m = record.measurements[i]!;
          const v = m.asLeftVerdict!;
          return `${m.label}: off by ${v.display.deviation.toPrecision(3)} ${v.display.label} — ${m.reason}`;
        });
        await this.outbox.enqueueMail(
          tx,
          outOfToleranceMail(
            this.config.settings.PUBLIC_URL,
            {
              recordId: id,
              positionId: row.positionId,
              place,
              documentNumber: rev.documentNumber,
              revisionLabel: rev.label,
            },
            await this.signing.notifyEmails(rev.ownerId, user.id, tx),
            user.displayName,
            lines,
          ),
        );
      }
    });
    return this.records.get(id);
  }

  async countersign(user: AuthUser, id: string, note: string): Promise<FieldRecord> {
    if (!mayCountersign(user.role)) {
      throw forbidden('The plant engineer, an engineer or a checker countersigns.');
    }
    await this.units.run(async (tx) => {
      const row = await this.repo.lockForUpdate(tx, id);
      if (!row) throw notFound('Field record not found.');
      if (row.status !== 'signed') {
        throw conflict(
          row.status === 'draft'
            ? 'The record must be signed by the technician first.'
            : 'The record is already countersigned.',
        );
      }
      const stored = (await this.repo.load(id, tx))!;
      const signer = stored.signatures.find((s) => s.kind === 'technician');
      if (signer?.userId === user.id || row.createdBy === user.id) {
        throw forbidden(
          'Someone other than the person who made and signed the record countersigns it.',
        );
      }
      await this.signing.addSignature(
        {
          recordId: id,
          kind: 'countersign',
          userId: user.id,
          displayName: user.displayName,
          initials: user.initials,
          note,
        },
        tx,
      );
      await this.repo.update(tx, id, { status: 'countersigned' });
      const rev = (await this.repo.revision(row.revisionId, tx))!;
      await this.audit.record(tx, {
        actorId: user.id,
        action: 'field-record.countersigned',
        entity: 'field-record',
        entityId: id,
        sheetId: rev.sheetId,
        after: { status: 'countersigned' },
      });
    });
    return this.records.get(id);
  }

  /** The public answer for a code printed on a field record; undefined when none carries it. */
  async verify(code: string): Promise<FieldRecordVerify | undefined> {
    const hit = await this.signing.byVerificationCode(code);
    if (!hit) return undefined;
    const r = await this.records.get(hit.id);
    return {
      kind: 'field-record',
      recordKind: r.kind,
      positionTag: r.positionTag,
      performedAt: r.performedAt,
      status: r.status,
      signedAt: r.signed?.at ?? null,
      countersignedAt: r.countersigned?.at ?? null,
      setTo: {
        documentNumber: r.documentNumber,
        revisionLabel: r.revisionLabel,
        current: !r.flags.superseded,
        underReview: r.flags.underReview,
      },
    };
  }
}
