import type { ColumnType, Generated, Selectable } from 'kysely';
import type { CreatedAt, Timestamp } from './database.js';

/** One-time password reset links (migration 20261203040000). */
export interface PasswordResetsTable {
  id: Generated<string>;
  userId: string;
  /** SHA-256 hex of the token in the mailed link; the token itself is never stored. */
  tokenHash: string;
  /** The admin who asked for the reset. */
  requestedBy: string | null;
  expiresAt: Timestamp;
  usedAt: ColumnType<Date | null, Date | string | null | undefined, Date | string | null>;
  createdAt: CreatedAt;
}

export interface AccountTables {
  passwordResets: PasswordResetsTable;
}

export type PasswordResetRow = Selectable<PasswordResetsTable>;
