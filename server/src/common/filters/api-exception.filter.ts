import {
  BadRequestException,
  Catch,
  HttpException,
  Logger,
  type ArgumentsHost,
  type ExceptionFilter,
} from '@nestjs/common';
import { ThrottlerException } from '@nestjs/throttler';
import {
  MAX_ATTACHMENT_BYTES,
  toFieldIssues,
  type ApiError,
  type ErrorCode,
} from '@holdfast/shared';
import type { Request, Response } from 'express';
import { ZodError } from 'zod';
import { ApiException } from '../errors/api-exception.js';
import { DATABASE_RETRY_AFTER_SECONDS, mapPostgresError } from '../errors/postgres-errors.js';
import { JSON_BODY_LIMIT_BYTES } from '../../http/body-limits.js';

const codeByStatus: Record<number, ErrorCode> = {
  400: 'validation_failed',
  401: 'unauthenticated',
  403: 'forbidden',
  404: 'not_found',
  409: 'conflict',
  413: 'payload_too_large',
  415: 'unsupported_media_type',
  429: 'too_many_requests',
  503: 'service_unavailable',
};

function codeFor(status: number): ErrorCode {
  return codeByStatus[status] ?? (status < 500 ? 'validation_failed' : 'internal_error');
}

/** body-parser and similar middleware errors: an http-errors object with `expose`. */
function isExposedHttpError(e: unknown): e is { status: number; message: string; type?: string } {
  return (
    typeof e === 'object' &&
    e !== null &&
    typeof (e as { status?: unknown }).status === 'number' &&
    (e as { expose?: unknown }).expose === true
  );
}

/** multer's "File too large" is the upload limit; anything else is the 1 MB JSON body limit. */
function tooLarge(message: string) {
  const upload = message === 'File too large';
  const limit = upload ? MAX_ATTACHMENT_BYTES : JSON_BODY_LIMIT_BYTES;
  const mb = `${limit / 1024 / 1024} MB`;
  const error: ApiError['error'] = {
    code: 'payload_too_large',
    message: upload
      ? `The file is too large (limit ${mb} per file).`
      : `The request body is too large (limit ${mb}).`,
    details: { limitBytes: limit },
  };
  return { status: 413, body: { error } };
}

/**
 * Every failure leaves the API as `{ error: { code, message, fields?, details? } }`.
 * Internal errors are logged with their stack and answered with a generic message.
 */
@Catch()
export class ApiExceptionFilter implements ExceptionFilter {
  private readonly logger = new Logger('ApiExceptionFilter');

  catch(exception: unknown, host: ArgumentsHost): void {
    const http = host.switchToHttp();
    const res = http.getResponse<Response>();
    const req = http.getRequest<Request>();
    const { status, body } = this.toResponse(exception, req);
    if (status === 503) {
      // A dependency is down (database, storage): expected during an outage, so no stack.
      this.logger.warn(`${req.method} ${req.originalUrl}: ${body.error.message}`);
    } else if (status >= 500) {
      this.logger.error(
        `${req.method} ${req.originalUrl} failed: ${exception instanceof Error ? exception.message : String(exception)}`,
        exception instanceof Error ? exception.stack : undefined,
      );
    }
    if (res.headersSent) return;
    if (status === 503) res.setHeader('Retry-After', String(DATABASE_RETRY_AFTER_SECONDS));
    res.status(status).json(body);
  }

  toResponse(exception: unknown, req: Request): { status: number; body: ApiError } {
    const make = (
      status: number,
      code: ErrorCode,
      message: string,
      extra: Partial<ApiError['error']> = {},
    ) => ({
      status,
      body: { error: { code, message, ...extra } },
    });
    if (exception instanceof ApiException) {
      const extra: Partial<ApiError['error']> = {};
      if (exception.fields) extra.fields = exception.fields;
      if (exception.details) extra.details = exception.details;
      return make(exception.getStatus(), exception.code, exception.message, extra);
    }
    if (exception instanceof ZodError) {
      return make(400, 'validation_failed', 'Some fields are not valid.', {
        fields: toFieldIssues(exception),
      });
    }
    if (exception instanceof ThrottlerException) {
      return make(429, 'too_many_requests', 'Too many attempts. Wait a minute and try again.');
    }
    if (exception instanceof HttpException) {
      const status = exception.getStatus();
      if (status === 404 && /^Cannot [A-Z]+ /.test(exception.message)) {
        return make(
          404,
          'not_found',
          `No API route ${req.method} ${req.originalUrl.split('?')[0]}.`,
        );
      }
      if (status === 413) return tooLarge(exception.message);
      if (
        status === 400 &&
        exception instanceof BadRequestException &&
        /JSON/.test(exception.message)
      ) {
        return make(400, 'validation_failed', 'The request body is not valid JSON.');
      }
      return make(status, codeFor(status), status >= 500 ? 'Internal error.' : exception.message);
    }
    const mapped = mapPostgresError(exception);
    if (mapped) return this.toResponse(mapped, req);
    if (isExposedHttpError(exception)) {
      const status = exception.status;
      const message =
        exception.type === 'entity.too.large'
          ? `The request body is too large (limit ${JSON_BODY_LIMIT_BYTES / 1024 / 1024} MB).`
          : exception.type === 'entity.parse.failed'
            ? 'The request body is not valid JSON.'
            : exception.message;
      return make(status, codeFor(status), message);
    }
    return make(500, 'internal_error', 'Internal error. It has been logged.');
  }
}
