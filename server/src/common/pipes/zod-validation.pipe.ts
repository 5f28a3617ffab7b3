import { Injectable, type PipeTransform } from '@nestjs/common';
import { findNul, toFieldIssues } from '@holdfast/shared';
import type { z } from 'zod';
import { badRequest } from '../errors/api-exception.js';

/**
 * Validates and parses one argument with a shared zod schema:
 * `@Body(new ZodValidationPipe(createUserSchema)) input: CreateUserInput`.
 * Failures become 400 `validation_failed` with `fields: [{ path, message }]`; use `.strict()`
 * schemas so unknown fields are rejected.
 */
@Injectable()
export class ZodValidationPipe<S extends z.ZodType> implements PipeTransform<unknown, z.output<S>> {
  constructor(
    private readonly schema: S,
    /** Prefix for field paths, e.g. 'query' or a route parameter name. */
    private readonly prefix?: string,
  ) {}

  transform(value: unknown): z.output<S> {
    // PostgreSQL stores no NUL in text or jsonb: refuse it anywhere, free JSON included.
    const nulAt = findNul(value);
    if (nulAt) {
      throw badRequest('Some fields are not valid.', [
        { path: this.prefixed(nulAt), message: 'must not contain control characters' },
      ]);
    }
    const result = this.schema.safeParse(value);
    if (result.success) return result.data;
    const fields = toFieldIssues(result.error).map((f) => ({ ...f, path: this.prefixed(f.path) }));
    throw badRequest('Some fields are not valid.', fields);
  }

  private prefixed(path: string): string {
    if (!this.prefix) return path;
    return path === '(body)' ? this.prefix : `${this.prefix}.${path}`;
  }
}
