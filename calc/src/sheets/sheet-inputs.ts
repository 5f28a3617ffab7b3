import { CalcInputError, FieldErrorCollector, isCalcInputError } from '../core/errors.js';
import type { FieldDefinition, SheetInputs } from '../core/types.js';
import { parseQuantity, requireRange } from '../units/parse.js';
import { DIMENSIONS } from '../units/unit-table.js';

/** Sheet inputs read into SI numbers, with typed getters. */
export interface ReadInputs {
  num(key: string): number;
  str(key: string): string;
  bool(key: string): boolean;
}

/** Position of each field by key, per fields array: fixed for a sheet type, so built once. */
const positionsByFields = new WeakMap<readonly FieldDefinition[], Map<string, number>>();

function positionsOf(fields: readonly FieldDefinition[]): Map<string, number> {
  let positions = positionsByFields.get(fields);
  if (!positions) {
    positions = new Map();
    for (let k = 0; k < fields.length; k++) positions.set(fields[k].key, k);
    positionsByFields.set(fields, positions);
  }
  return positions;
}

/**
 * Reads every field of a sheet (falling back to its default) into SI numbers, checking bounds.
 * All field errors are collected and thrown together as one CalcInputError. Unknown keys in the
 * inputs are ignored (a later core version may drop a field without breaking old revisions).
 */
export function readInputs(fields: readonly FieldDefinition[], inputs: SheetInputs): ReadInputs {
  if (typeof inputs !== 'object' || inputs === null || Array.isArray(inputs)) {
    throw new CalcInputError([
      { field: 'inputs', message: 'inputs must be an object keyed by field' },
    ]);
  }
  // Values by field position rather than a Map filled per call: a sheet reads ~60 fields on
  // every evaluation, and the key → position index is the same each time.
  const positions = positionsOf(fields);
  const values: (number | string | boolean)[] = new Array(fields.length);
  const errors = new FieldErrorCollector();
  for (let k = 0; k < fields.length; k++) {
    const f = fields[k];
    try {
      values[k] = readOne(f, inputs[f.key] ?? f.default);
    } catch (e) {
      if (!isCalcInputError(e)) throw e;
      errors.errors.push(...e.fields);
    }
  }
  errors.throwIfAny();
  const get = (key: string) => values[positions.get(key) ?? -1];
  return {
    num: (k) => get(k) as number,
    str: (k) => get(k) as string,
    bool: (k) => get(k) as boolean,
  };
}

function fail(f: FieldDefinition, message: string): never {
  throw new CalcInputError([{ field: f.key, message }]);
}

function readOne(f: FieldDefinition, raw: unknown): number | string | boolean {
  switch (f.kind) {
    case 'boolean':
      if (typeof raw !== 'boolean') fail(f, 'expected true or false');
      return raw as boolean;
    case 'choice':
      if (!f.choices?.some((c) => c.value === raw)) {
        fail(f, `expected one of: ${f.choices?.map((c) => c.value).join(', ')}`);
      }
      return raw as string;
    case 'quantity': {
      const dim = f.dimension ?? 'dimensionless';
      const v = parseQuantity(raw as never, dim, f.key);
      // The field carries its own bounds (min, max, exclusiveMin).
      requireRange(v, f.key, f, DIMENSIONS[dim].siLabel);
      return v;
    }
    default: {
      const v = typeof raw === 'string' && raw.trim() !== '' ? Number(raw) : raw;
      if (typeof v !== 'number' || !Number.isFinite(v)) fail(f, 'expected a finite number');
      if (f.kind === 'integer' && !Number.isInteger(v)) fail(f, 'expected a whole number');
      requireRange(v as number, f.key, f);
      return v as number;
    }
  }
}
