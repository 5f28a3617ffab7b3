import { HttpException } from '@nestjs/common';
import type { ErrorCode, FieldIssue } from '@holdfast/shared';

/** An HTTP failure already in the API's shape; the global filter writes it out as is. */
export class ApiException extends HttpException {
  constructor(
    status: number,
    readonly code: ErrorCode,
    message: string,
    readonly fields?: FieldIssue[],
    readonly details?: Record<string, unknown>,
  ) {
    super(message, status);
  }
}

export const badRequest = (message: string, fields?: FieldIssue[]) =>
  new ApiException(400, 'validation_failed', message, fields);
export const unauthenticated = (message = 'Sign in to continue.') =>
  new ApiException(401, 'unauthenticated', message);
export const forbidden = (message = 'Your role does not allow this.') =>
  new ApiException(403, 'forbidden', message);
export const notFound = (message = 'Not found.') => new ApiException(404, 'not_found', message);
export const conflict = (message: string, details?: Record<string, unknown>) =>
  new ApiException(409, 'conflict', message, undefined, details);
