import { CalcInputError, FieldErrorCollector } from '../core/errors.js';
import type { FieldDefinition, SheetInputs } from '../core/types.js';
import { parseQuantity, requireRange } from '../units/parse.js';

/**
 * Reads every field of a sheet into SI numbers (quantities), numbers, integers or booleans,
 * checking each against its bounds; collects all field errors and throws them together.
 */
export function readSheetInputs(
  fields: readonly FieldDefinition[],
  inputs: SheetInputs,
): Record<string, number | boolean | string> {
  const out: Record<string, number | boolean | string> = {};
  const errors = new FieldErrorCollector();
  for (const f of fields) {
    const raw = inputs[f.key] ?? f.default;
    errors.capture(() => {
      out[f.key] = readOne(f, raw);
    }, undefined);
  }
  errors.throwIfAny();
  return out;
}

function readOne(f: FieldDefinition, raw: unknown): number | boolean | string {
  const fail = (message: string): never => {
    throw new CalcInputError([{ field: f.key, message }]);
  };
  switch (f.kind) {
    case 'boolean':
      if (typeof raw !== 'boolean') fail('expected true or false');
      return raw as boolean;
    case 'choice': {
      const ok = f.choices?.some((c) => c.value === raw);
      if (!ok) fail(`expected one of ${f.choices?.map((c) => c.value).join(', ')}`);
      return raw as string;
    }
    case 'quantity': {
      const v = parseQuantity(raw as never, f.dimension ?? 'dimensionless', f.key);
      requireRange(v, f.key, { min: f.min, max: f.max, exclusiveMin: f.exclusiveMin });
      return v;
    }
    default: {
      const v = typeof raw === 'string' && raw.trim() !== '' ? Number(raw) : raw;
      if (typeof v !== 'number' || !Number.isFinite(v)) fail('expected a finite number');
      if (f.kind === 'integer' && !Number.isInteger(v)) fail('expected a whole number');
      requireRange(v as number, f.key, { min: f.min, max: f.max, exclusiveMin: f.exclusiveMin });
      return v as number;
    }
  }
}
