import {
  CORE_VERSION,
  CRITERIA_SETS,
  demoInputs,
  fieldStart,
  missingInputs,
  resolveInputs,
  settingBands,
  unknownInputKeys,
  type ResolvedInput,
  getSheetType,
  criterionSpec,
  isCalcInputError as calcInputErrorGuard,
  type CriteriaSet,
  type FieldError,
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

/** The SI unit the core states a criterion in; undefined for a key it does not declare. */
export function criterionUnit(key: string): string | undefined {
  return criterionSpec(key)?.unit;
}

/** The criteria sets shipped with the core (seeded as version 1 in the database). */
export function shippedCriteriaSets(): CriteriaSet[] {
  return [...CRITERIA_SETS];
}

/** Motions whose brakes the crane sets govern when the sheet type does not say (a caliper). */
const MOTION_SET: Readonly<Record<string, 'hoist' | 'travel'>> = {
  hoist: 'hoist',
  'auxiliary-hoist': 'hoist',
  trolley: 'travel',
  bridge: 'travel',
};

/**
 * The criteria set a new sheet uses unless the engineer picks another: a shoe brake on a hoist the
 * hoist set, on a travel drive the travel-drive set; a sheet type that fits any drive (a caliper
 * disc brake, a disc-spring stack) follows the motion of its brake position, so a caliper on a
 * hoist rope drum is held to the hoist set; the rest take the general one.
 */
export function defaultCriteriaSetId(sheetType: string, motion?: string): string {
  const sets = shippedCriteriaSets();
  if (sets.length === 0) throw new Error('the calculation core ships no criteria sets');
  const prefer = sheetType.startsWith('hoist')
    ? 'hoist'
    : sheetType.startsWith('travel')
      ? 'travel'
      : ((motion === undefined ? undefined : MOTION_SET[motion]) ?? 'general');
  return (sets.find((s) => s.id.includes(prefer)) ?? sets[0]).id;
}

/** A fresh copy of a sheet type's demo inputs (the invented example duty). */
export function demoInputsOf(sheetType: string): SheetInputs {
  return demoInputs(sheetTypeDefinition(sheetType));
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

/**
 * The setting tables of an evaluation checked row by row against the whole sheet, for the record
 * a submission freezes (the printed table and the field card say which rows pass every check).
 * It evaluates the sheet some thirty times, so a draft's save does without it: the editor works
 * the bands out in the browser while its field settings are open.
 */
export function settingBandsOf(
  sheetType: string,
  inputs: SheetInputs,
  criteria: CriteriaSet,
  evaluation: SheetEvaluation,
): SheetEvaluation['settingBands'] {
  return settingBands(
    sheetTypeDefinition(sheetType),
    structuredClone(inputs),
    criteria,
    evaluation,
  );
}

/** Keys in the inputs that the sheet type does not declare, with a suggestion where close. */
export function unknownInputsOf(sheetType: string, inputs: SheetInputs): FieldError[] {
  return unknownInputKeys(sheetTypeDefinition(sheetType).fields, inputs);
}

/**
 * Stored inputs carried into a new draft, without keys this sheet type no longer declares (an
 * input an older core asked for and the current one derives, such as the shoe sheets' fixed
 * lining wear): the engineer could not see or clear them, and save would refuse them.
 */
export function withoutRetiredInputs(sheetType: string, inputs: SheetInputs): SheetInputs {
  const known = new Set(sheetTypeDefinition(sheetType).fields.map((f) => f.key));
  return Object.fromEntries(Object.entries(inputs).filter(([key]) => known.has(key)));
}

/** The inputs as the core uses them, as entered and in SI (throws CalcInputError like evaluate). */
export function resolveInputsOf(sheetType: string, inputs: SheetInputs): ResolvedInput[] {
  return resolveInputs(sheetTypeDefinition(sheetType).fields, inputs);
}

/** Required fields absent from the inputs. */
export function missingInputsOf(sheetType: string, inputs: SheetInputs): FieldError[] {
  return missingInputs(sheetTypeDefinition(sheetType).fields, inputs);
}

/**
 * Re-evaluate a stored record (drift and impact checks). Records frozen before inputs had to be
 * complete were evaluated with the core's then values for the fields they leave out, which are
 * today's demo values; they are filled back in here only, so those records keep evaluating as
 * they did. New inputs never get this (see evaluate.ts).
 */
export function evaluateStoredRecord(
  sheetType: string,
  inputs: SheetInputs,
  criteria: CriteriaSet,
): SheetEvaluation {
  const def = sheetTypeDefinition(sheetType);
  const missing = missingInputs(def.fields, inputs);
  const filled = missing.length
    ? {
        ...Object.fromEntries(
          missing.map((f) => [f.field, def.fields.find((x) => x.key === f.field)!.demo]),
        ),
        ...inputs,
      }
    : inputs;
  return def.evaluate(structuredClone(filled), criteria);
}

/** Field label for compare and messages; the key itself when the field is unknown. */
export function fieldLabel(sheetType: string, key: string): string {
  return getSheetType(sheetType)?.fields.find((f) => f.key === key)?.label ?? key;
}

export const isCalcInputError = calcInputErrorGuard;
