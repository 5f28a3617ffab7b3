import {
  CORE_VERSION,
  CRITERIA_SETS,
  demoInputs,
  getSheetType,
  isCalcInputError as calcInputErrorGuard,
  type CriteriaSet,
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

/** A fresh copy of a sheet type's demo inputs (the invented example duty). */
export function demoInputsOf(sheetType: string): SheetInputs {
  return demoInputs(sheetTypeDefinition(sheetType));
}

/** @deprecated the demo values are not defaults: use `demoInputsOf`. */
export const defaultInputs = demoInputsOf;

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
