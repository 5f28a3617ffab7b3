import { apiErrorSchema, type ErrorCode, type FieldIssue } from '@holdfast/shared';

export type ClientErrorCode = ErrorCode | 'network_error' | 'unexpected_response';

const fallbackMessages: Record<number, string> = {
  0: 'Cannot reach the Holdfast server. Check the connection and try again.',
  400: 'The request was not accepted.',
  401: 'Your session has ended. Sign in again.',
  403: 'Your role does not allow this.',
  404: 'Not found.',
  409: 'Someone else changed this in the meantime.',
  413: 'The file or request is too large.',
  429: 'Too many attempts. Wait a minute, then try again.',
  503: 'The server is not ready. Try again shortly.',
};

/** A failed API call, parsed from the `{ error: { code, message, fields } }` envelope. */
export class ApiRequestError extends Error {
  override readonly name = 'ApiRequestError';
  constructor(
    readonly status: number,
    readonly code: ClientErrorCode,
    message: string,
    readonly fields: FieldIssue[] = [],
    readonly details?: Record<string, unknown>,
  ) {
    super(message);
  }

  /** `{ 'path.to.field': 'reason' }`, ready for Mantine's `form.setErrors`. */
  fieldErrors(): Record<string, string> {
    const out: Record<string, string> = {};
    for (const f of this.fields) out[f.path] ??= f.message;
    return out;
  }

  static network(cause?: unknown): ApiRequestError {
    const error = new ApiRequestError(0, 'network_error', fallbackMessages[0]!);
    if (cause !== undefined) (error as { cause?: unknown }).cause = cause;
    return error;
  }

  /** Build from a status and a parsed (or unparsable) body. */
  static fromBody(status: number, body: unknown): ApiRequestError {
    const parsed = apiErrorSchema.safeParse(body);
    if (parsed.success) {
      const { code, message, fields, details } = parsed.data.error;
      return new ApiRequestError(status, code, message, fields ?? [], details);
    }
    const message = fallbackMessages[status] ?? `The server answered ${status}.`;
    return new ApiRequestError(status, codeForStatus(status), message);
  }
}

function codeForStatus(status: number): ClientErrorCode {
  switch (status) {
    case 400:
      return 'validation_failed';
    case 401:
      return 'unauthenticated';
    case 403:
      return 'forbidden';
    case 404:
      return 'not_found';
    case 409:
      return 'conflict';
    case 413:
      return 'payload_too_large';
    case 415:
      return 'unsupported_media_type';
    case 429:
      return 'too_many_requests';
    case 503:
      return 'service_unavailable';
    default:
      return status >= 500 ? 'internal_error' : 'unexpected_response';
  }
}

export function isApiRequestError(value: unknown): value is ApiRequestError {
  return value instanceof ApiRequestError;
}

/** A plain sentence for any thrown value, for notifications and error panels. */
export function errorMessage(error: unknown): string {
  if (error instanceof ApiRequestError) return error.message;
  if (error instanceof Error) return error.message;
  return 'Something went wrong.';
}
