import type { FieldTolerance, ToleranceVerdict } from '@holdfast/calc';
import type {
  FieldCheckInput,
  FieldMeasurement,
  FieldRecord,
  FieldRecordKind,
  FieldTarget,
  PersonRef,
} from '@holdfast/shared';
import type { PositionPlace } from '@holdfast/shared';
import type { FieldRecordMeasurementRow } from '@holdfast/db';
import type { RecordRevision, StoredFieldRecord } from './field-records.repository.js';
import { fieldTargets, judgeMeasurement } from '../calc/field-targets.js';

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

/**
 * A measurement as the record shows it. A signed record shows the judgement stored when it was
 * signed, so a later calc release that declares another tolerance changes nothing on it. A draft
 * is judged now, against its revision's frozen targets. Rows signed before the judgement was
 * stored (migration 20261205030000) hold none and are judged now as well: for them, the shown
 * verdicts still follow the current tolerance declarations (docs/field-records.md).
 */
function measurementOf(
  m: FieldRecordMeasurementRow,
  status: FieldRecord['status'],
  targets: ReadonlyMap<string, FieldTarget>,
): FieldMeasurement {
  const input = {
    settingKey: m.settingKey,
    asFound: m.asFound,
    asLeft: m.asLeft,
    reason: m.reason,
  };
  if (status === 'draft' || m.dimension === null) return judgeMeasurement(input, targets);
  return {
    ...input,
    // The label is the frozen evaluation's, as on the field card the fitter worked from.
    label: targets.get(m.settingKey)?.label ?? m.settingKey,
    target: m.target,
    unit: m.unit ?? '',
    dimension: m.dimension,
    tolerance: (m.tolerance as FieldTolerance | null) ?? null,
    asFoundVerdict: (m.asFoundVerdict as ToleranceVerdict | null) ?? null,
    asLeftVerdict: (m.asLeftVerdict as ToleranceVerdict | null) ?? null,
  };
}

/** What a record shows for its place if its position row were gone (the schema forbids it). */
export const NO_PLACE: PositionPlace = { siteCode: '', machineTag: '', positionTag: '' };

export function toFieldRecord(
  s: StoredFieldRecord,
  rev: RecordRevision,
  place: PositionPlace,
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
    positionTag: place.positionTag,
    machineTag: place.machineTag,
    siteCode: place.siteCode,
    revisionId: r.revisionId,
    sheetId: rev.sheetId,
    documentNumber: rev.documentNumber,
    revisionLabel: rev.label,
    kind: r.kind as FieldRecordKind,
    status: r.status,
    performedAt: r.performedAt.toISOString(),
    meterHours: r.meterHours,
    measurements: s.measurements.map((m) => measurementOf(m, r.status, targets)),
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
