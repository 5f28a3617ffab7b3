import type { FieldDefinition, InputValue } from '@holdfast/calc';
import { isQuantity } from './units';

/**
 * How a field starts on a new sheet: whether the engineer must enter it, and its example value,
 * both from the sheet definition (the server's `fieldStart` in calc-engine.ts says the same).
 * Required numbers and quantities start blank; choices and flags at their demo value.
 */
export function fieldStart(field: FieldDefinition): { required: boolean; example: InputValue } {
  return {
    required: field.required && field.kind !== 'choice' && field.kind !== 'boolean',
    example: field.demo,
  };
}

/** A hint for a blank field, e.g. "e.g. 400 (example duty)". */
export function examplePlaceholder(field: FieldDefinition): string | undefined {
  const { example } = fieldStart(field);
  const value = isQuantity(example) ? example.value : example;
  return typeof value === 'number' ? `e.g. ${value} (example duty)` : undefined;
}
