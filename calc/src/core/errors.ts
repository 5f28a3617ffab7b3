import type { FieldError } from './types.js';

/**
 * Invalid input to a calculation: every offending field with the reason. Thrown by parsers,
 * formula functions called outside their validity range, and sheet evaluate().
 */
export class CalcInputError extends Error {
  readonly code = 'CALC_INPUT' as const;
  readonly fields: readonly FieldError[];

  constructor(fields: FieldError[], message?: string) {
    super(message ?? CalcInputError.summarise(fields));
    this.name = 'CalcInputError';
    this.fields = fields;
  }

  private static summarise(fields: FieldError[]): string {
    if (fields.length === 0) return 'Invalid input';
    return `Invalid input: ${fields.map((f) => `${f.field}: ${f.message}`).join('; ')}`;
  }
}

/** Type guard usable across package boundaries (instanceof can fail with duplicated modules). */
export function isCalcInputError(e: unknown): e is CalcInputError {
  return (
    typeof e === 'object' &&
    e !== null &&
    (e as { code?: unknown }).code === 'CALC_INPUT' &&
    Array.isArray((e as { fields?: unknown }).fields)
  );
}

/**
 * Collects field errors so a whole input set is reported at once, not one field at a time.
 */
export class FieldErrorCollector {
  readonly errors: FieldError[] = [];

  add(field: string, message: string): void {
    this.errors.push({ field, message });
  }

  /** Runs fn and records a CalcInputError's fields instead of throwing; returns fallback then. */
  capture<T>(fn: () => T, fallback: T): T {
    try {
      return fn();
    } catch (e) {
      if (isCalcInputError(e)) {
        this.errors.push(...e.fields);
        return fallback;
      }
      throw e;
    }
  }

  throwIfAny(): void {
    if (this.errors.length > 0) throw new CalcInputError([...this.errors]);
  }
}

/** Throws a CalcInputError for one field unless the condition holds. */
export function requireField(condition: boolean, field: string, message: string): void {
  if (!condition) throw new CalcInputError([{ field, message }]);
}
