import type { SheetTypeDefinition } from '../core/types.js';
import { caliperDiscBrakeSheet } from './caliper-disc-brake.js';
import { discSpringStackSheet } from './disc-spring-stack.js';
import { hoistShoeBrakeSheet } from './hoist-shoe-brake.js';
import { travelShoeBrakeSheet } from './travel-shoe-brake.js';

/** Every sheet type of this core version, in the order a UI lists them. */
export const sheetTypes: readonly SheetTypeDefinition[] = [
  hoistShoeBrakeSheet,
  travelShoeBrakeSheet,
  caliperDiscBrakeSheet,
  discSpringStackSheet,
];

/** The sheet type with this id, or undefined. */
export function getSheetType(id: string): SheetTypeDefinition | undefined {
  return sheetTypes.find((s) => s.id === id);
}

/** Default inputs of a sheet type (each field's default), e.g. to start a new sheet. */
export function defaultInputs(
  sheet: SheetTypeDefinition,
): Record<string, SheetTypeDefinition['fields'][number]['default']> {
  return Object.fromEntries(sheet.fields.map((f) => [f.key, f.default]));
}
