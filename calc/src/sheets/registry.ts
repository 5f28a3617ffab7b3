import type {
  FieldDefinition,
  InputValue,
  SheetInputs,
  SheetTypeDefinition,
} from '../core/types.js';
import type { SheetTypeId } from '../ids.js';
import { caliperDiscBrakeSheet } from './caliper-disc-brake.js';
import { discSpringStackSheet } from './disc-spring-stack.js';
import { hoistShoeBrakeSheet } from './hoist-shoe-brake.js';
import { travelShoeBrakeSheet } from './travel-shoe-brake.js';
import { driveShoeBrakeSheet } from './drive-shoe-brake.js';

/** Every sheet type of this core version, in the order a UI lists them. */
export const sheetTypes = [
  hoistShoeBrakeSheet,
  travelShoeBrakeSheet,
  driveShoeBrakeSheet,
  caliperDiscBrakeSheet,
  discSpringStackSheet,
] as const satisfies readonly SheetTypeDefinition[];

// The registry lists exactly the ids of ../ids.ts, in its order (the sheets test checks it too).
type RegistryIds = (typeof sheetTypes)[number]['id'];
const sameIds: [RegistryIds, SheetTypeId] extends [SheetTypeId, RegistryIds] ? true : never = true;
void sameIds;

/** The sheet type with this id, or undefined. */
export function getSheetType(id: string): SheetTypeDefinition | undefined {
  return (sheetTypes as readonly SheetTypeDefinition[]).find((s) => s.id === id);
}

/**
 * The invented demo duty of a sheet type (each field's demo value, as a fresh copy): for examples,
 * the demo seed and a sheet started from the example. Never a fallback for a missing input.
 */
export function demoInputs(sheet: SheetTypeDefinition): SheetInputs {
  return Object.fromEntries(sheet.fields.map((f) => [f.key, structuredClone(f.demo)]));
}

/**
 * How a field starts on a new sheet: whether the engineer must enter it (blank on an empty sheet)
 * and its example value. Numbers and quantities the sheet declares required start blank; choices
 * and flags start at their demo value, marked unconfirmed.
 */
export function fieldStart(field: FieldDefinition): { required: boolean; example: InputValue } {
  return {
    required: field.required && field.kind !== 'choice' && field.kind !== 'boolean',
    example: field.demo,
  };
}
