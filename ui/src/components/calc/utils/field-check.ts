import { fromSI, toSI, withUnit, type FieldDefinition, type InputValue } from '@holdfast/calc';
import { messageNumber, readNumber, type NumberFormat } from './number-entry';
import { isQuantity, unitLabel } from './units';

/**
 * The message for one field, in the words and the unit the engineer is looking at, or null when
 * the field holds a usable value. The calc core checks the same bounds in SI for the server and
 * the printout; this speaks them in the field's own unit ("at most 170°", not 2.967 rad).
 */
export function checkField(
  field: FieldDefinition,
  value: InputValue | undefined,
  format: NumberFormat,
): string | null {
  if (field.kind === 'choice' || field.kind === 'boolean') return null;
  if (value === undefined || value === null || value === '') return 'Required: enter a value.';
  if (typeof value === 'string') {
    const entry = readNumber(value, format);
    if (entry.kind === 'empty') return 'Required: enter a value.';
    if (entry.kind !== 'number') return entry.message;
    if (entry.unitText !== '') {
      return field.kind === 'quantity'
        ? `“${entry.unitText}” is not a unit for this field: pick one from the list.`
        : 'This field takes a plain number, without a unit.';
    }
    return rangeMessage(field, entry.value, '', format);
  }
  if (typeof value === 'number') return rangeMessage(field, value, '', format);
  if (isQuantity(value)) {
    if (!Number.isFinite(value.value)) return 'Not a number.';
    return rangeMessage(field, value.value, value.unit, format);
  }
  return null;
}

/** Bounds of a field spoken in `unit` (the unit shown beside the field). */
function rangeMessage(
  field: FieldDefinition,
  typed: number,
  unit: string,
  format: NumberFormat,
): string | null {
  if (field.kind === 'integer' && !Number.isInteger(typed)) return 'Enter a whole number.';
  const dimension = field.dimension;
  const quantity = field.kind === 'quantity' && dimension !== undefined;
  let si = typed;
  let shown = (x: number) => x;
  if (quantity) {
    try {
      si = toSI(typed, unit, dimension);
      shown = (x: number) => fromSI(x, unit, dimension);
    } catch {
      return `“${unit}” is not a unit for this field: pick one from the list.`;
    }
  }
  const label = quantity ? unitLabel(dimension, unit) : '';
  const say = (x: number) => withUnit(messageNumber(shown(x), format), label);
  const { min, max, exclusiveMin } = field;
  if (min !== undefined && (exclusiveMin ? !(si > min) : !(si >= min))) {
    return `Must be ${exclusiveMin ? 'more than' : 'at least'} ${say(min)}.`;
  }
  if (max !== undefined && !(si <= max)) return `Must be at most ${say(max)}.`;
  return null;
}

/**
 * Field messages to show: the calc core's (and the server's) per field, each replaced by the
 * field's own message when there is one, plus fields the core would read but the UI refuses.
 */
export function fieldMessages(
  fields: readonly FieldDefinition[],
  inputs: Record<string, InputValue>,
  coreErrors: Record<string, string>,
  format: NumberFormat,
): Record<string, string> {
  const out: Record<string, string> = {};
  for (const field of fields) {
    const own = checkField(field, inputs[field.key], format);
    const core = coreErrors[field.key];
    if (own) out[field.key] = own;
    else if (core) out[field.key] = core;
  }
  for (const [key, message] of Object.entries(coreErrors)) out[key] ??= message;
  return out;
}
