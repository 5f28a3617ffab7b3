import type { FieldTolerance } from '@holdfast/calc';

/** A signature on a printed field record. */
export interface PrintFieldSignature {
  name: string;
  initials: string;
  /** ISO 8601. */
  at: string;
}

/** One measured value of a field record as printed: SI values in the setting's unit. */
export interface PrintFieldMeasurement {
  settingKey: string;
  label: string;
  target: number | null;
  dimension: string;
  tolerance: FieldTolerance | null;
  asFound: number | null;
  asLeft: number | null;
  /** Whether the as-left value lies within its tolerance; null when there is no verdict. */
  asLeftWithin: boolean | null;
  /** Why an as-left value outside its tolerance was accepted. */
  reason: string;
}

/** One check item of a field record as printed. */
export interface PrintFieldCheck {
  label: string;
  result: 'ok' | 'not-ok' | 'not-applicable';
  /** Lining thickness, m; null when the item has none. */
  value: number | null;
  cycles: number | null;
  note: string;
}

/** A photo filed with a field record: the printout names it so it can be found and matched. */
export interface PrintFieldPhoto {
  fileName: string;
  /** SHA-256 of the stored bytes, hex. */
  sha256: string;
  /** Bytes. */
  size: number;
  /** Who filed it, and when (ISO 8601). */
  by: string;
  at: string;
}

/**
 * Everything the printed field record shows of the record itself, as plain data; the sheet it was
 * set to comes beside it as a `PrintableSheet`. The server builds it from the stored record.
 */
export interface PrintableFieldRecord {
  /** e.g. 'Periodic inspection'. */
  kindLabel: string;
  positionTag: string;
  /** ISO 8601. */
  performedAt: string;
  meterHours: number | null;
  documentNumber: string;
  revisionLabel: string;
  status: 'draft' | 'signed' | 'countersigned';
  flags: { superseded: boolean; underReview: boolean };
  measurements: PrintFieldMeasurement[];
  checks: PrintFieldCheck[];
  findings: string;
  photos: PrintFieldPhoto[];
  signed: PrintFieldSignature | null;
  countersigned: PrintFieldSignature | null;
}
