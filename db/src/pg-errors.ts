/** SQLSTATE codes the server maps to HTTP in one place (server/src/common/filters). */
export const PG_UNIQUE_VIOLATION = '23505';
export const PG_FOREIGN_KEY_VIOLATION = '23503';
export const PG_CHECK_VIOLATION = '23514';
export const PG_NOT_NULL_VIOLATION = '23502';

export interface PostgresError extends Error {
  code: string;
  constraint?: string;
  detail?: string;
}

/** True for errors raised by PostgreSQL (pg's DatabaseError carries a 5-character SQLSTATE). */
export function isPostgresError(error: unknown): error is PostgresError {
  if (!(error instanceof Error) || !('severity' in error)) return false;
  const code: unknown = (error as { code?: unknown }).code;
  return typeof code === 'string' && /^[0-9A-Z]{5}$/.test(code);
}
