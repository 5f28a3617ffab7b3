import type { FieldCheckInput, FieldRecord, FieldRecordKind, PersonRef } from '@holdfast/shared';
import type { RecordRevision, StoredFieldRecord } from './field-records.repository.js';
import { fieldTargets, judgeMeasurement } from './field-targets.js';

type People = Map<string, PersonRef>;

/** Flags of a record: its revision superseded since, or under review. */
export function recordFlags(rev: RecordRevision) {
  return {
    superseded:
      rev.state === 'superseded' ||
      (rev.approvedRevisionId !== null && rev.approvedRevisionId !== rev.revisionId),
    underReview: rev.underReview,
  };
}

export function toFieldRecord(
  s: StoredFieldRecord,
  rev: RecordRevision,
  positionTag: string,
  people: People,
): FieldRecord {
  const r = s.record;
  const targets = new Map(
    fieldTargets(rev.sheetType, rev.evaluation).map((t) => [t.settingKey, t]),
  );
  const sig = (kind: 'technician' | 'countersign') => {
    const x = s.signatures.find((g) => g.kind === kind);
    return x
      ? {
          by: { id: x.userId, displayName: x.displayName, initials: x.initials },
          at: x.signedAt.toISOString(),
        }
      : null;
  };
  return {
    id: r.id,
    positionId: r.positionId,
    positionTag,
    revisionId: r.revisionId,
    sheetId: rev.sheetId,
    documentNumber: rev.documentNumber,
    revisionLabel: rev.label,
    kind: r.kind as FieldRecordKind,
    status: r.status,
    performedAt: r.performedAt.toISOString(),
    meterHours: r.meterHours,
    measurements: s.measurements.map((m) =>
      judgeMeasurement(
        { settingKey: m.settingKey, asFound: m.asFound, asLeft: m.asLeft, reason: m.reason },
        targets,
      ),
    ),
    checks: s.checks.map((c): FieldCheckInput => ({
      key: c.key as FieldCheckInput['key'],
      result: c.result as FieldCheckInput['result'],
      value: c.value,
      cycles: c.cycles,
      note: c.note,
    })),
    findings: r.findings,
    outOfTolerance: r.outOfTolerance,
    flags: recordFlags(rev),
    createdBy: people.get(r.createdBy) ?? {
      id: r.createdBy,
      displayName: 'Unknown user',
      initials: '??',
    },
    createdAt: r.createdAt.toISOString(),
    updatedAt: r.updatedAt.toISOString(),
    signed: sig('technician'),
    countersigned: sig('countersign'),
    verificationCode: r.verificationCode,
  };
}
