import type { PrintableFieldRecord, PrintFieldSignature } from '@holdfast/print';
import { fieldRecordKindLabels, type Attachment, type FieldRecord } from '@holdfast/shared';
import { checkLabels } from '../../calc/field-targets.js';

const signature = (s: FieldRecord['signed']): PrintFieldSignature | null =>
  s && { name: s.by.displayName, initials: s.by.initials, at: s.at };

/** The printed field record's own data, from the stored record (labels in the sheet type's words). */
export function printableFieldRecord(
  r: FieldRecord,
  sheetType: string,
  photos: Attachment[],
): PrintableFieldRecord {
  const labels = checkLabels(sheetType);
  return {
    kindLabel: fieldRecordKindLabels[r.kind],
    positionTag: r.positionTag,
    performedAt: r.performedAt,
    meterHours: r.meterHours,
    documentNumber: r.documentNumber,
    revisionLabel: r.revisionLabel,
    status: r.status,
    flags: { superseded: r.flags.superseded, underReview: r.flags.underReview },
    measurements: r.measurements.map((m) => ({
      settingKey: m.settingKey,
      label: m.label,
      target: m.target,
      dimension: m.dimension,
      tolerance: m.tolerance,
      asFound: m.asFound,
      asLeft: m.asLeft,
      asLeftWithin: m.asLeftVerdict ? m.asLeftVerdict.status === 'in' : null,
      reason: m.reason,
    })),
    checks: r.checks.map((c) => ({
      label: labels[c.key] ?? c.key,
      result: c.result,
      value: c.value,
      cycles: c.cycles,
      note: c.note,
    })),
    findings: r.findings,
    photos: photos.map((p) => ({
      fileName: p.fileName,
      sha256: p.sha256,
      size: p.size,
      by: p.uploadedBy.displayName,
      at: p.createdAt,
    })),
    signed: signature(r.signed),
    countersigned: signature(r.countersigned),
  };
}
