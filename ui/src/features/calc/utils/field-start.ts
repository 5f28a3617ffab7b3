import type { FieldDefinition, InputValue } from '@holdfast/calc';
import { isQuantity } from './units';

/**
 * How a field starts on a new sheet: whether the engineer must enter it, and its example value.
 * Today every number and quantity is required and the field default is the example (the server's
 * `fieldStart` in calc-engine.ts says the same); this is the one place to re-point when sheet
 * definitions declare `required` and demo values per field.
 */
export function fieldStart(field: FieldDefinition): { required: boolean; example: InputValue } {
  return { required: field.kind !== 'choice' && field.kind !== 'boolean', example: field.default };
}

/** A hint for a blank field, e.g. "e.g. 400 (example duty)". */
export function examplePlaceholder(field: FieldDefinition): string | undefined {
  const { example } = fieldStart(field);
  const value = isQuantity(example) ? example.value : example;
  return typeof value === 'number' ? `e.g. ${value} (example duty)` : undefined;
}
