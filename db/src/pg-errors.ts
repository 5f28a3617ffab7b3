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

/** Socket-level failures Node reports while PostgreSQL is down, restarting or unreachable. */
const NETWORK_CODES = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'EPIPE',
  'ETIMEDOUT',
  'EHOSTUNREACH',
  'ENETUNREACH',
  'ENOTFOUND',
  'EAI_AGAIN',
]);

/** pg's own messages for a connection that died or never came up (it gives them no code). */
const CONNECTION_MESSAGES =
  /Connection terminated|connection timeout|timeout exceeded when trying to connect|not queryable|Client was closed|Connection refused/i;

/**
 * True when the error means "the database cannot be reached right now" rather than "this
 * statement is wrong": SQLSTATE class 08 (connection exception), 57P01-57P03 (shutting down,
 * crashed, starting up), 53300 (too many connections), network errors, and pg's connection
 * messages. The server answers these with 503 and Retry-After; the pool reconnects by itself.
 */
export function isConnectionError(error: unknown, depth = 0): boolean {
  if (!(error instanceof Error) || depth > 4) return false;
  const code: unknown = (error as { code?: unknown }).code;
  if (typeof code === 'string') {
    if (code.startsWith('08') || ['57P01', '57P02', '57P03', '53300'].includes(code)) return true;
    if (NETWORK_CODES.has(code)) return true;
  }
  if (!('severity' in error) && CONNECTION_MESSAGES.test(error.message)) return true;
  if (error instanceof AggregateError && error.errors.some((e) => isConnectionError(e, depth + 1)))
    return true;
  return isConnectionError((error as { cause?: unknown }).cause, depth + 1);
}
