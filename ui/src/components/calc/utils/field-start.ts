import { fieldStart, type FieldDefinition } from '@holdfast/calc';
import { isQuantity } from './units';

/** A hint for a blank field, e.g. "e.g. 400 (example duty)". */
export function examplePlaceholder(field: FieldDefinition): string | undefined {
  const { example } = fieldStart(field);
  const value = isQuantity(example) ? example.value : example;
  return typeof value === 'number' ? `e.g. ${value} (example duty)` : undefined;
}
