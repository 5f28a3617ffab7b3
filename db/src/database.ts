import type { ColumnType, Generated, Insertable, Selectable, Updateable } from 'kysely';
import type { AccountTables } from './account-tables.js';
import type { SheetTables } from './sheet-tables.js';
import type { ReviewTables } from './review-tables.js';
import type { FieldRecordTables } from './field-record-tables.js';

/**
 * The typed database interface, written by hand to match `db/migrations`.
 *
 * Naming: tables and columns are snake_case in PostgreSQL; the application sees them in camelCase
 * through Kysely's `CamelCasePlugin` (see `createDatabase`). So table `refresh_tokens` is
 * `refreshTokens` here and column `password_hash` is `passwordHash`. Migrations take `Kysely<any>`
 * without the plugin and spell names in snake_case. JSON column contents keep their own keys.
 *
 * Feature modules add their tables by extending this interface in their own file and merging it
 * into `DB` below (one line each), so that `Kysely<DB>` knows every table.
 */

/** A timestamp read as Date, written as Date or ISO string, defaulted by the database. */
export type CreatedAt = ColumnType<Date, Date | string | undefined, never>;
export type UpdatedAt = ColumnType<Date, Date | string | undefined, Date | string>;
export type Timestamp = ColumnType<Date, Date | string, Date | string>;

export type RoleValue = 'engineer' | 'checker' | 'viewer' | 'admin' | 'technician';
export type UnitSystemValue = 'SI' | 'US';
export type NumberFormatValue = 'point' | 'comma';

export interface UsersTable {
  id: Generated<string>;
  /** Stored lower-case; unique over lower(email). */
  email: string;
  displayName: string;
  initials: string;
  role: RoleValue;
  /** argon2id encoded hash. */
  passwordHash: string;
  active: Generated<boolean>;
  unitSystem: Generated<UnitSystemValue>;
  /** Raised by sign-out and password changes; access tokens of an older version are refused. */
  sessionVersion: Generated<number>;
  /** Decimal separator the user types: 'point' (2.5) or 'comma' (2,5). */
  numberFormat: Generated<NumberFormatValue>;
  createdAt: CreatedAt;
  updatedAt: UpdatedAt;
}

export interface RefreshTokensTable {
  id: Generated<string>;
  userId: string;
  /** SHA-256 hex of the opaque token; the token itself is never stored. */
  tokenHash: string;
  expiresAt: Timestamp;
  revokedAt: ColumnType<Date | null, Date | string | null | undefined, Date | string | null>;
  /** The token this one replaced on refresh (rotation chain). */
  rotatedFrom: string | null;
  createdAt: CreatedAt;
}

export interface FoundationTables {
  users: UsersTable;
  refreshTokens: RefreshTokensTable;
}

export interface DB
  extends FoundationTables, SheetTables, ReviewTables, AccountTables, FieldRecordTables {}

export type UserRow = Selectable<UsersTable>;
export type NewUserRow = Insertable<UsersTable>;
export type UserRowUpdate = Updateable<UsersTable>;
export type RefreshTokenRow = Selectable<RefreshTokensTable>;
