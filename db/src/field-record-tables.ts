import type { ColumnType, Selectable } from 'kysely';
import type { CreatedAt, Timestamp, UpdatedAt } from './database.js';

type Nullable<T> = ColumnType<T | null, T | null | undefined, T | null>;
type Defaulted<T> = ColumnType<T, T | undefined, T>;

/** db/migrations/20261204010000_field_records.ts: what the fitters set and found. */
export interface FieldRecordsTable {
  /** Generated on the device (idempotent create). */
  id: string;
  positionId: string;
  revisionId: string;
  kind: string;
  status: Defaulted<'draft' | 'signed' | 'countersigned'>;
  performedAt: Timestamp;
  meterHours: Nullable<number>;
  findings: Defaulted<string>;
  outOfTolerance: Defaulted<boolean>;
  verificationCode: Nullable<string>;
  createdBy: string;
  createdAt: CreatedAt;
  updatedAt: UpdatedAt;
}

export interface FieldRecordMeasurementsTable {
  recordId: string;
  settingKey: string;
  ordinal: number;
  asFound: Nullable<number>;
  asLeft: Nullable<number>;
  reason: Defaulted<string>;
  // What the measurement was judged against and its verdicts (20261205030000): written at every
  // save of a draft and last at signing; null on rows signed before that migration.
  target: Nullable<number>;
  unit: Nullable<string>;
  dimension: Nullable<string>;
  /** calc's FieldTolerance; written as JSON text. */
  tolerance: ColumnType<unknown, string | null | undefined, string | null>;
  /** calc's ToleranceVerdict; written as JSON text. */
  asFoundVerdict: ColumnType<unknown, string | null | undefined, string | null>;
  asLeftVerdict: ColumnType<unknown, string | null | undefined, string | null>;
}

export interface FieldRecordChecksTable {
  recordId: string;
  key: string;
  result: string;
  value: Nullable<number>;
  cycles: Nullable<number>;
  note: Defaulted<string>;
}

export interface FieldRecordSignaturesTable {
  recordId: string;
  kind: 'technician' | 'countersign';
  userId: string;
  displayName: string;
  initials: string;
  signedAt: CreatedAt;
  note: Defaulted<string>;
}

export interface InspectionIntervalsTable {
  positionId: string;
  basis: 'days' | 'hours';
  every: number;
  remindDaysAhead: Defaulted<number>;
  updatedBy: string;
  updatedAt: UpdatedAt;
}

export interface InspectionRemindersTable {
  positionId: string;
  /** A date column: read as 'yyyy-mm-dd' text when the connection parses dates as text, else Date. */
  dueOn: ColumnType<Date | string, string, never>;
  sentAt: CreatedAt;
}

export interface FieldRecordTables {
  fieldRecords: FieldRecordsTable;
  fieldRecordMeasurements: FieldRecordMeasurementsTable;
  fieldRecordChecks: FieldRecordChecksTable;
  fieldRecordSignatures: FieldRecordSignaturesTable;
  inspectionIntervals: InspectionIntervalsTable;
  inspectionReminders: InspectionRemindersTable;
}

export type FieldRecordRow = Selectable<FieldRecordsTable>;
export type FieldRecordMeasurementRow = Selectable<FieldRecordMeasurementsTable>;
export type FieldRecordCheckRow = Selectable<FieldRecordChecksTable>;
export type FieldRecordSignatureRow = Selectable<FieldRecordSignaturesTable>;
