import { CalcInputError, FieldErrorCollector, isCalcInputError } from '../core/errors.js';
import type { FieldDefinition, FieldError, ResolvedInput, SheetInputs } from '../core/types.js';
import { parseQuantity, requireRange } from '../units/parse.js';
import { DIMENSIONS } from '../units/unit-table.js';
import type { InputsOf } from './field-builders.js';

/** The message a missing required field carries (the core, the API and the CLI all say this). */
export const MISSING_MESSAGE = 'required: enter a value';

/**
 * Reads every declared field of a sheet into SI numbers, choice values and flags, checking bounds,
 * and returns them as one typed object keyed by field. A missing required field is an error for
 * that field: the core never puts a value of its own in place of one the engineer did not enter.
 * All field errors are collected and thrown together as one CalcInputError. Keys the sheet does
 * not declare are ignored here (a stored revision may hold a key an older core version knew);
 * `unknownInputKeys` is what refuses them where new inputs come in.
 */
export function readInputs<const Fs extends readonly FieldDefinition[]>(
  fields: Fs,
  inputs: SheetInputs,
): InputsOf<Fs> {
  if (typeof inputs !== 'object' || inputs === null || Array.isArray(inputs)) {
    throw new CalcInputError([
      { field: 'inputs', message: 'inputs must be an object keyed by field' },
    ]);
  }
  const values: Record<string, number | string | boolean> = {};
  const errors = new FieldErrorCollector();
  for (let k = 0; k < fields.length; k++) {
    const f = fields[k]!; // k < fields.length
    const raw = inputs[f.key];
    // A box left empty is the same as a field left out: missing when required, else not used.
    if (isBlank(raw)) {
      if (isRequired(f, inputs)) errors.errors.push({ field: f.key, message: MISSING_MESSAGE });
      continue;
    }
    try {
      values[f.key] = readOne(f, raw);
    } catch (e) {
      if (!isCalcInputError(e)) throw e;
      errors.errors.push(...e.fields);
    }
  }
  errors.throwIfAny();
  return values as InputsOf<Fs>;
}

/** Whether the field must be present in these inputs (its `requiredIf` flag, if any, is on). */
export function isRequired(f: FieldDefinition, inputs: SheetInputs): boolean {
  return f.required && (f.requiredIf === undefined || inputs[f.requiredIf] !== false);
}

/** Absent, null or blank text (a field the editor left empty). */
function isBlank(v: unknown): boolean {
  return v === undefined || v === null || (typeof v === 'string' && v.trim() === '');
}

/** The required fields missing from `inputs`, one error each, in the sheet's field order. */
export function missingInputs(
  fields: readonly FieldDefinition[],
  inputs: SheetInputs,
): FieldError[] {
  return fields
    .filter((f) => isRequired(f, inputs) && isBlank(inputs[f.key]))
    .map((f) => ({ field: f.key, message: MISSING_MESSAGE }));
}

/**
 * Keys in `inputs` that the sheet does not declare, one error each, with the closest declared key
 * as a suggestion when it is near enough to be a slip of the keyboard.
 */
export function unknownInputKeys(
  fields: readonly FieldDefinition[],
  inputs: SheetInputs,
): FieldError[] {
  const known = new Set(fields.map((f) => f.key));
  const out: FieldError[] = [];
  for (const key of Object.keys(inputs)) {
    if (known.has(key)) continue;
    const near = closestKey(
      key,
      fields.map((f) => f.key),
    );
    out.push({
      field: key,
      message: `not a field of this sheet type${near ? `; did you mean "${near}"?` : ''}`,
    });
  }
  return out;
}

/** The declared key nearest to `key` (case-insensitive edit distance), if it is close enough. */
export function closestKey(key: string, keys: readonly string[]): string | undefined {
  const a = key.toLowerCase();
  let best: string | undefined;
  let bestDistance = Infinity;
  for (const k of keys) {
    const d = editDistance(a, k.toLowerCase());
    if (d < bestDistance) {
      bestDistance = d;
      best = k;
    }
  }
  // A third of the key's length: 'sprngRate' finds 'springRate', 'bogusField' finds nothing.
  return bestDistance <= Math.max(1, Math.floor(key.length / 3)) ? best : undefined;
}

/** Levenshtein distance (insert, delete, substitute; each costs one). */
export function editDistance(a: string, b: string): number {
  let prev = Array.from({ length: b.length + 1 }, (_, j) => j);
  // Every index below is in range: prev and cur hold b.length + 1 entries, i ≤ a.length, j ≤ b.length.
  for (let i = 1; i <= a.length; i++) {
    const cur = [i];
    for (let j = 1; j <= b.length; j++) {
      cur[j] = Math.min(
        prev[j]! + 1,
        cur[j - 1]! + 1,
        prev[j - 1]! + (a[i - 1] === b[j - 1] ? 0 : 1),
      );
    }
    prev = cur;
  }
  return prev[b.length]!;
}

function fail(f: FieldDefinition, message: string): never {
  throw new CalcInputError([{ field: f.key, message }]);
}

/** One field's entered value in SI (quantities), as a number, a choice value or a flag. */
export function readOne(f: FieldDefinition, raw: unknown): number | string | boolean {
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

/**
 * The inputs the core evaluates, resolved field by field in the sheet's order: what a frozen
 * revision stores beside its evaluation and the printed inputs table shows. Fields left out (only
 * those not required) are omitted; throws CalcInputError as `readInputs` does.
 */
export function resolveInputs(
  fields: readonly FieldDefinition[],
  inputs: SheetInputs,
): ResolvedInput[] {
  readInputs(fields, inputs);
  const out: ResolvedInput[] = [];
  for (const f of fields) {
    const raw = inputs[f.key];
    if (raw === undefined || raw === null) continue;
    out.push({
      key: f.key,
      entered: structuredClone(raw),
      si: readOne(f, raw),
      siUnit: f.kind === 'quantity' ? DIMENSIONS[f.dimension ?? 'dimensionless'].siUnit : '',
    });
  }
  return out;
}
