import type { ColumnType, Generated, Selectable } from 'kysely';
import type { CreatedAt } from './database.js';

type Nullable<T> = ColumnType<T | null, T | null | undefined, T | null>;
type NullableDate = ColumnType<Date | null, Date | string | null | undefined, Date | string | null>;

/** db/migrations/20261203020100_criteria_reviews.ts: "under review" flags beside approvals. */
export interface CriteriaReviewsTable {
  id: Generated<string>;
  revisionId: string;
  sheetId: string;
  criteriaSetId: string;
  criteriaSetVersion: number;
  failing: ColumnType<unknown, string, string>;
  flaggedAt: CreatedAt;
  clearedAt: NullableDate;
  clearedBy: Nullable<string>;
  clearedHow: Nullable<'superseded' | 'disposition'>;
  disposition: Nullable<string>;
}

/** db/migrations/20261203020200_criteria_confirmations.ts: values checked against documents. */
export interface CriteriaConfirmationsTable {
  id: Generated<string>;
  criteriaSetId: string;
  version: number;
  key: string;
  document: string;
  clause: string;
  confirmedBy: string;
  confirmedAt: CreatedAt;
}

export interface ReviewTables {
  criteriaReviews: CriteriaReviewsTable;
  criteriaConfirmations: CriteriaConfirmationsTable;
}

export type CriteriaReviewRow = Selectable<CriteriaReviewsTable>;
