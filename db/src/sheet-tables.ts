import type { ColumnType, Generated, Selectable } from 'kysely';
import type { CreatedAt, UpdatedAt } from './database.js';

/**
 * Tables of the sheets feature (register, criteria sets, sheets, revisions, comments,
 * attachments, audit trail, outbox), matching db/migrations/20261202*. camelCase per CamelCasePlugin.
 */

type Nullable<T> = ColumnType<T | null, T | null | undefined, T | null>;
type NullableDate = ColumnType<Date | null, Date | string | null | undefined, Date | string | null>;
/** jsonb: written as a JSON string or value, read back parsed. */
type Json<T = unknown> = ColumnType<T, T | string, T | string>;

export interface SitesTable {
  id: Generated<string>;
  code: string;
  name: string;
  nextSheetNumber: Generated<number>;
  createdAt: CreatedAt;
}

export interface MachinesTable {
  id: Generated<string>;
  siteId: string;
  tag: string;
  name: string;
  kind: string;
  createdAt: CreatedAt;
}

export interface BrakePositionsTable {
  id: Generated<string>;
  machineId: string;
  tag: string;
  description: string;
  motion: string;
  /** In the plant's words, e.g. 'two-shoe drum brake, 400 mm'; '' until recorded. */
  brakeKind: Generated<string>;
  thruster: Generated<string>;
  lining: Generated<string>;
  createdAt: CreatedAt;
}

export interface CriteriaSetsTable {
  id: string;
  name: string;
  description: string;
  createdAt: CreatedAt;
}

export interface CriteriaSetVersionsTable {
  criteriaSetId: string;
  version: number;
  values: Json;
  note: Nullable<string>;
  publishedBy: Nullable<string>;
  publishedAt: CreatedAt;
}

export interface SheetsTable {
  id: Generated<string>;
  documentNumber: string;
  title: string;
  positionId: string;
  machineId: string;
  siteId: string;
  tags: Generated<string>;
  sheetType: string;
  ownerId: string;
  criteriaSetId: string;
  latestRevisionId: Nullable<string>;
  latestState: Nullable<string>;
  approvedRevisionId: Nullable<string>;
  searchText: ColumnType<string, never, never>;
  createdAt: CreatedAt;
  updatedAt: UpdatedAt;
}

export interface RevisionsTable {
  id: Generated<string>;
  sheetId: string;
  seq: number;
  label: string;
  state: Generated<string>;
  inputs: Json;
  unitSystem: Generated<string>;
  criteriaSetId: string;
  criteriaSetVersion: number;
  evaluation: ColumnType<unknown, unknown, unknown>;
  coreVersion: Nullable<string>;
  hash: Nullable<string>;
  verificationCode: Nullable<string>;
  authorId: string;
  checkerId: Nullable<string>;
  changeNote: Generated<string>;
  justification: Nullable<string>;
  /** Field keys still holding a value nobody entered or confirmed (JSON array of strings). */
  unconfirmed: ColumnType<string[], string | undefined, string>;
  checkNote: Nullable<string>;
  rowVersion: Generated<number>;
  createdAt: CreatedAt;
  updatedAt: UpdatedAt;
  submittedAt: NullableDate;
  approvedAt: NullableDate;
  returnedAt: NullableDate;
  supersededAt: NullableDate;
  supersededById: Nullable<string>;
  /** Everyone who saved a change (four-eyes by person; the list only grows). */
  editorIds: Generated<string[]>;
  /** Everyone who submitted it for check. */
  submitterIds: Generated<string[]>;
}

export interface CommentsTable {
  id: Generated<string>;
  revisionId: string;
  parentId: Nullable<string>;
  authorId: string;
  body: string;
  anchorKind: Nullable<string>;
  anchorKey: Nullable<string>;
  resolved: Generated<boolean>;
  resolvedBy: Nullable<string>;
  resolvedAt: NullableDate;
  createdAt: CreatedAt;
}

export interface AttachmentsTable {
  id: Generated<string>;
  revisionId: string;
  fileName: string;
  contentType: string;
  /** bigint; read as number (int8 parser in connection.ts). */
  size: number;
  sha256: string;
  storageKey: string;
  uploadedBy: string;
  /** Set for a photo of a field record (the record owns it; revisionId is the record's revision). */
  fieldRecordId: ColumnType<string | null, string | null | undefined, never>;
  createdAt: CreatedAt;
}

export interface AuditEventsTable {
  id: Generated<string>;
  at: CreatedAt;
  actorId: Nullable<string>;
  action: string;
  entity: string;
  entityId: string;
  sheetId: Nullable<string>;
  before: ColumnType<unknown, unknown, never>;
  after: ColumnType<unknown, unknown, never>;
}

export interface OutboxTable {
  id: Generated<string>;
  kind: string;
  payload: Json;
  createdAt: CreatedAt;
  attempts: Generated<number>;
  lastError: Nullable<string>;
  sentAt: NullableDate;
}

export interface SheetTables {
  sites: SitesTable;
  machines: MachinesTable;
  brakePositions: BrakePositionsTable;
  criteriaSets: CriteriaSetsTable;
  criteriaSetVersions: CriteriaSetVersionsTable;
  sheets: SheetsTable;
  revisions: RevisionsTable;
  comments: CommentsTable;
  attachments: AttachmentsTable;
  auditEvents: AuditEventsTable;
  outbox: OutboxTable;
}

export type SheetRow = Selectable<SheetsTable>;
export type RevisionRow = Selectable<RevisionsTable>;
export type CommentRow = Selectable<CommentsTable>;
export type AttachmentRow = Selectable<AttachmentsTable>;
