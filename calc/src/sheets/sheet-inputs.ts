import { CalcInputError, FieldErrorCollector } from '../core/errors.js';
import type { FieldDefinition, SheetInputs } from '../core/types.js';
import { parseQuantity, requireRange } from '../units/parse.js';
import { DIMENSIONS } from '../units/unit-table.js';

/** Sheet inputs read into SI numbers, with typed getters. */
export interface ReadInputs {
  num(key: string): number;
  str(key: string): string;
  bool(key: string): boolean;
}

/**
 * Reads every field of a sheet (falling back to its default) into SI numbers, checking bounds.
 * All field errors are collected and thrown together as one CalcInputError. Unknown keys in the
 * inputs are ignored (a later core version may drop a field without breaking old revisions).
 */
export function readInputs(fields: readonly FieldDefinition[], inputs: SheetInputs): ReadInputs {
  const values = new Map<string, number | string | boolean>();
  const errors = new FieldErrorCollector();
  if (typeof inputs !== 'object' || inputs === null || Array.isArray(inputs)) {
    throw new CalcInputError([
      { field: 'inputs', message: 'inputs must be an object keyed by field' },
    ]);
  }
  for (const f of fields) {
    const raw = inputs[f.key] ?? f.default;
    errors.capture(() => values.set(f.key, readOne(f, raw)), undefined);
  }
  errors.throwIfAny();
  return {
    num: (k) => values.get(k) as number,
    str: (k) => values.get(k) as string,
    bool: (k) => values.get(k) as boolean,
  };
}

function readOne(f: FieldDefinition, raw: unknown): number | string | boolean {
  const fail = (message: string): never => {
    throw new CalcInputError([{ field: f.key, message }]);
  };
  const bounds = { min: f.min, max: f.max, exclusiveMin: f.exclusiveMin };
  switch (f.kind) {
    case 'boolean':
      if (typeof raw !== 'boolean') fail('expected true or false');
      return raw as boolean;
    case 'choice':
      if (!f.choices?.some((c) => c.value === raw)) {
        fail(`expected one of: ${f.choices?.map((c) => c.value).join(', ')}`);
      }
      return raw as string;
    case 'quantity': {
      const dim = f.dimension ?? 'dimensionless';
      const v = parseQuantity(raw as never, dim, f.key);
      requireRange(v, f.key, bounds, DIMENSIONS[dim].siLabel);
      return v;
    }
    default: {
      const v = typeof raw === 'string' && raw.trim() !== '' ? Number(raw) : raw;
      if (typeof v !== 'number' || !Number.isFinite(v)) fail('expected a finite number');
      if (f.kind === 'integer' && !Number.isInteger(v)) fail('expected a whole number');
      requireRange(v as number, f.key, bounds);
      return v as number;
    }
  }
}
