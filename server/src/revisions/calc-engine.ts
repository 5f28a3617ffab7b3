import {
  CORE_VERSION,
  CRITERIA_SETS,
  getSheetType,
  isCalcInputError as calcInputErrorGuard,
  type CriteriaSet,
  type FieldDefinition,
  type InputValue,
  type SheetEvaluation,
  type SheetInputs,
  type SheetTypeDefinition,
} from '@holdfast/calc';

/**
 * The server's one door into the calculation core's registry: sheet types, their defaults and
 * the shipped criteria sets. Everything that evaluates a revision goes through here, so the core
 * version and the criteria set used are recorded in one way.
 */

export class UnknownSheetTypeError extends Error {
  constructor(readonly sheetType: string) {
    super(`sheet type "${sheetType}" is not in the calculation core`);
  }
}

/** The sheet type definition, or an UnknownSheetTypeError. */
export function sheetTypeDefinition(id: string): SheetTypeDefinition {
  const found = getSheetType(id);
  if (!found) throw new UnknownSheetTypeError(id);
  return found;
}

/** The criteria sets shipped with the core (seeded as version 1 in the database). */
export function shippedCriteriaSets(): CriteriaSet[] {
  return [...CRITERIA_SETS];
}

/**
 * The criteria set a new sheet of this type uses unless the engineer picks another: hoist brakes
 * the hoist set, travel brakes the travel-drive set, the rest the general one.
 */
export function defaultCriteriaSetId(sheetType: string): string {
  const sets = shippedCriteriaSets();
  if (sets.length === 0) throw new Error('the calculation core ships no criteria sets');
  const prefer = sheetType.startsWith('hoist')
    ? 'hoist'
    : sheetType.startsWith('travel')
      ? 'travel'
      : 'general';
  return (sets.find((s) => s.id.includes(prefer)) ?? sets[0]).id;
}

/** A fresh copy of a sheet type's default inputs. */
export function defaultInputs(sheetType: string): SheetInputs {
  const def = sheetTypeDefinition(sheetType);
  return Object.fromEntries(
    def.fields.map((f) => [f.key, structuredClone(f.default)]),
  ) as SheetInputs;
}

/**
 * How a field starts on a new sheet: whether the engineer must enter it (blank on an empty sheet)
 * and its example value. Today every number and quantity is required and the field default is the
 * example; this one adapter is where sheet definitions that declare `required` and demo values
 * per field plug in.
 */
export function fieldStart(field: FieldDefinition): { required: boolean; example: InputValue } {
  return { required: field.kind !== 'choice' && field.kind !== 'boolean', example: field.default };
}

/**
 * The inputs of a new sheet and the fields left unconfirmed. Empty: required fields blank, the
 * rest (choices, flags) at their example value and unconfirmed. Example: every field at its
 * example value and every one unconfirmed.
 */
export function startingInputs(
  sheetType: string,
  kind: 'empty' | 'example',
): { inputs: SheetInputs; unconfirmed: string[] } {
  const inputs: SheetInputs = {};
  const unconfirmed: string[] = [];
  for (const f of sheetTypeDefinition(sheetType).fields) {
    const start = fieldStart(f);
    if (kind === 'empty' && start.required) {
      inputs[f.key] = '';
    } else {
      inputs[f.key] = structuredClone(start.example);
      unconfirmed.push(f.key);
    }
  }
  return { inputs, unconfirmed };
}

/** Keys of fields left blank (a draft may be saved incomplete; submit refuses it). */
export function blankFields(inputs: SheetInputs): string[] {
  return Object.entries(inputs)
    .filter(([, v]) => v === '' || (typeof v === 'string' && v.trim() === ''))
    .map(([k]) => k);
}

/** Current calculation-core version (stored with each evaluation). */
export function coreVersion(): string {
  return CORE_VERSION;
}

/** Evaluate stored inputs; throws the core's CalcInputError on bad input. */
export function evaluateSheet(
  sheetType: string,
  inputs: SheetInputs,
  criteria: CriteriaSet,
): SheetEvaluation {
  return sheetTypeDefinition(sheetType).evaluate(structuredClone(inputs), criteria);
}

/** Field label for compare and messages; the key itself when the field is unknown. */
export function fieldLabel(sheetType: string, key: string): string {
  return getSheetType(sheetType)?.fields.find((f) => f.key === key)?.label ?? key;
}

export const isCalcInputError = calcInputErrorGuard;
