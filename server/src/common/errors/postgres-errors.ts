import {
  isConnectionError,
  isPostgresError,
  PG_CHECK_VIOLATION,
  PG_FOREIGN_KEY_VIOLATION,
  PG_UNIQUE_VIOLATION,
} from '@holdfast/db';
import { ApiException } from './api-exception.js';

/** Seconds a client should wait before retrying while the database is unreachable. */
export const DATABASE_RETRY_AFTER_SECONDS = 2;

/**
 * 503: PostgreSQL cannot be reached (down, restarting, connection lost mid-request). The pool
 * reconnects by itself; the client repeats after Retry-After.
 */
export const databaseUnavailable = () =>
  new ApiException(
    503,
    'service_unavailable',
    'The database is not reachable right now. Try again in a few seconds.',
  );

/**
 * The one place where PostgreSQL failures become HTTP: a unique violation is a 409, a missing
 * referenced row or a broken check is a 400, a lost or refused connection is a 503. Anything else stays a 500 (returns undefined).
 */
export function mapPostgresError(error: unknown): ApiException | undefined {
  if (isConnectionError(error)) return databaseUnavailable();
  if (!isPostgresError(error)) return undefined;
  const details = error.constraint ? { constraint: error.constraint } : undefined;
  switch (error.code) {
    case PG_UNIQUE_VIOLATION:
      return new ApiException(
        409,
        'conflict',
        'A record with these values already exists.',
        undefined,
        details,
      );
    case PG_FOREIGN_KEY_VIOLATION:
      return new ApiException(
        400,
        'validation_failed',
        'A referenced record does not exist.',
        undefined,
        details,
      );
    case PG_CHECK_VIOLATION:
      return new ApiException(
        400,
        'validation_failed',
        'A value is outside what is allowed.',
        undefined,
        details,
      );
    case '22P02': // invalid text representation, e.g. a malformed uuid reaching SQL
      return new ApiException(400, 'validation_failed', 'A value has the wrong format.');
    default:
      return undefined;
  }
}
