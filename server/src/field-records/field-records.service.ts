import { Injectable } from '@nestjs/common';
import type {
  CreateFieldRecordInput,
  FieldForm,
  FieldIssue,
  FieldMeasurementInput,
  FieldRecord,
  FieldRecordSummary,
  UpdateFieldRecordInput,
} from '@holdfast/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { AuditService } from '../audit/audit.service.js';
import { badRequest, conflict, forbidden, notFound } from '../common/errors/api-exception.js';
import { type Tx, UnitOfWork } from '../database/unit-of-work.js';
import { UsersRepository } from '../users/users.repository.js';
import { canReadContent } from '../revisions/revision-access.js';
import { NO_PLACE, toFieldRecord } from './field-record-mapper.js';
import {
  FieldRecordsRepository,
  type RecordRevision,
  type StoredFieldRecord,
} from './field-records.repository.js';
import {
  fieldTargets,
  formChecks,
  judgeMeasurement,
  outOfToleranceAsLeft,
} from '../calc/field-targets.js';

export const invalid = (fields: FieldIssue[]) => badRequest('Some fields are not valid.', fields);

/**
 * The rules of field records up to signing: made against an approved revision of the position's
 * sheet, a draft edited only by whoever made it. Signing, countersigning and the public answer
 * for a printed code are FieldRecordSigningService's.
 */
@Injectable()
export class FieldRecordsService {
  constructor(
    private readonly units: UnitOfWork,
    private readonly repo: FieldRecordsRepository,
    private readonly users: UsersRepository,
    private readonly audit: AuditService,
  ) {}

  /** A revision a field record may be made against: one that was released (approved). */
  private async releasedRevision(
    user: AuthUser,
    revisionId: string,
    tx?: Tx,
  ): Promise<RecordRevision> {
    const rev = await this.repo.revision(revisionId, tx);
    if (!rev || !canReadContent(user, rev)) throw notFound('Revision not found.');
    if (rev.state !== 'approved' && rev.state !== 'superseded') {
      throw invalid([
        { path: 'revisionId', message: 'field records are made against an approved revision' },
      ]);
    }
    return rev;
  }

  async form(user: AuthUser, revisionId: string): Promise<FieldForm> {
    const rev = await this.releasedRevision(user, revisionId);
    return {
      revisionId: rev.revisionId,
      sheetId: rev.sheetId,
      documentNumber: rev.documentNumber,
      revisionLabel: rev.label,
      sheetType: rev.sheetType,
      positionId: rev.positionId,
      targets: fieldTargets(rev.sheetType, rev.evaluation),
      checks: formChecks(rev.sheetType, rev.inputs),
    };
  }

  private async present(s: StoredFieldRecord, tx?: Tx): Promise<FieldRecord> {
    const rev = (await this.repo.revision(s.record.revisionId, tx))!;
    const place = await this.repo.positionPlace(s.record.positionId, tx);
    const people = await this.users.people([s.record.createdBy], tx);
    return toFieldRecord(s, rev, place ?? NO_PLACE, people);
  }

  async get(id: string): Promise<FieldRecord> {
    const s = await this.repo.load(id);
    if (!s) throw notFound('Field record not found.');
    return this.present(s);
  }

  async list(filter: { positionId?: string; status?: string }): Promise<FieldRecordSummary[]> {
    const items = await this.history(filter);
    return items.map((r) => ({
      id: r.id,
      positionId: r.positionId,
      positionTag: r.positionTag,
      machineTag: r.machineTag,
      siteCode: r.siteCode,
      revisionId: r.revisionId,
      documentNumber: r.documentNumber,
      revisionLabel: r.revisionLabel,
      kind: r.kind,
      status: r.status,
      performedAt: r.performedAt,
      meterHours: r.meterHours,
      outOfTolerance: r.outOfTolerance,
      flags: r.flags,
      signed: r.signed,
      countersigned: r.countersigned,
    }));
  }

  /** Full records, oldest first. */
  async history(filter: { positionId?: string; status?: string }): Promise<FieldRecord[]> {
    const stored = await this.repo.list(filter);
    const out: FieldRecord[] = [];
    for (const s of stored) out.push(await this.present(s));
    return out;
  }

  /** Measured keys must be on the revision's field card; returns the out-of-tolerance flag. */
  private judge(rev: RecordRevision, measurements: FieldMeasurementInput[]) {
    const targets = new Map(
      fieldTargets(rev.sheetType, rev.evaluation).map((t) => [t.settingKey, t]),
    );
    const issues: FieldIssue[] = [];
    measurements.forEach((m, i) => {
      if (!targets.has(m.settingKey)) {
        issues.push({
          path: `measurements.${i}.settingKey`,
          message: `${m.settingKey} is not a value of this revision's field card`,
        });
      }
    });
    if (issues.length) throw invalid(issues);
    const judged = measurements.map((m) => judgeMeasurement(m, targets));
    return { judged, out: outOfToleranceAsLeft(judged).length > 0 };
  }

  /** Idempotent by the client's id: the same id again returns the stored record, created false. */
  async create(
    user: AuthUser,
    input: CreateFieldRecordInput,
  ): Promise<{ record: FieldRecord; created: boolean }> {
    const existing = await this.repo.load(input.id);
    if (existing) return this.sameRecord(user, existing, input);
    const rev = await this.releasedRevision(user, input.revisionId);
    if (rev.positionId !== input.positionId) {
      throw invalid([{ path: 'positionId', message: "not the position of the revision's sheet" }]);
    }
    const { judged, out } = this.judge(rev, input.measurements);
    const created = await this.units.run(async (tx) => {
      const fresh = await this.repo.insert(tx, {
        id: input.id,
        positionId: input.positionId,
        revisionId: input.revisionId,
        kind: input.kind,
        performedAt: input.performedAt,
        meterHours: input.meterHours,
        findings: input.findings,
        outOfTolerance: out,
        createdBy: user.id,
      });
      if (!fresh) return false;
      await this.repo.replaceMeasurements(tx, input.id, judged);
      await this.repo.replaceChecks(tx, input.id, input.checks);
      await this.audit.record(tx, {
        actorId: user.id,
        action: 'field-record.created',
        entity: 'field-record',
        entityId: input.id,
        sheetId: rev.sheetId,
        after: { kind: input.kind, revision: rev.label, position: input.positionId },
      });
      return true;
    });
    const stored = (await this.repo.load(input.id))!;
    if (!created) return this.sameRecord(user, stored, input);
    return { record: await this.present(stored), created: true };
  }

  /** A retried create: the same maker gets the stored record; anyone else a conflict. */
  private async sameRecord(user: AuthUser, s: StoredFieldRecord, input: CreateFieldRecordInput) {
    if (s.record.createdBy !== user.id || s.record.positionId !== input.positionId) {
      throw conflict('A field record with this id already exists.', { id: input.id });
    }
    return { record: await this.present(s), created: false };
  }

  async update(user: AuthUser, id: string, input: UpdateFieldRecordInput): Promise<FieldRecord> {
    await this.units.run(async (tx) => {
      const row = await lockOwnDraft(this.repo, tx, user, id);
      const rev = (await this.repo.revision(row.revisionId, tx))!;
      const stored = (await this.repo.load(id, tx))!;
      const measurements =
        input.measurements ??
        stored.measurements.map((m) => ({
          settingKey: m.settingKey,
          asFound: m.asFound,
          asLeft: m.asLeft,
          reason: m.reason,
        }));
      const { judged, out } = this.judge(rev, measurements);
      await this.repo.update(tx, id, {
        ...(input.kind !== undefined ? { kind: input.kind } : {}),
        ...(input.performedAt !== undefined ? { performedAt: input.performedAt } : {}),
        ...(input.meterHours !== undefined ? { meterHours: input.meterHours } : {}),
        ...(input.findings !== undefined ? { findings: input.findings } : {}),
        outOfTolerance: out,
      });
      // Judged again at every save, so a draft's stored judgement is today's.
      await this.repo.replaceMeasurements(tx, id, judged);
      if (input.checks) await this.repo.replaceChecks(tx, id, input.checks);
      await this.audit.record(tx, {
        actorId: user.id,
        action: 'field-record.updated',
        entity: 'field-record',
        entityId: id,
        sheetId: rev.sheetId,
        after: { fields: Object.keys(input) },
      });
    });
    return this.get(id);
  }
}

/** Locks a draft for a change or a signature by its maker; anything else is refused. */
export async function lockOwnDraft(
  repo: FieldRecordsRepository,
  tx: Tx,
  user: AuthUser,
  id: string,
) {
  const row = await repo.lockForUpdate(tx, id);
  if (!row) throw notFound('Field record not found.');
  if (row.createdBy !== user.id)
    throw forbidden('Only the person who made this record may change or sign it.');
  if (row.status !== 'draft')
    throw conflict(`The record is ${row.status} and can no longer change.`);
  return row;
}
