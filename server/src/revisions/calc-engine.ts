import * as calc from '@holdfast/calc';
import type {
  CriteriaSet,
  SheetEvaluation,
  SheetInputs,
  SheetTypeDefinition,
} from '@holdfast/calc';

/**
 * The server's one door into the calculation core's registry: sheet types, their defaults and
 * the shipped criteria sets. Everything that evaluates a revision goes through here, so the core
 * version and the criteria set used are recorded in one way.
 */

type Registry = {
  getSheetType?: (id: string) => SheetTypeDefinition | undefined;
  sheetTypes?: readonly SheetTypeDefinition[] | Record<string, SheetTypeDefinition>;
  criteriaSets?: readonly CriteriaSet[] | Record<string, CriteriaSet>;
  shippedCriteriaSets?: readonly CriteriaSet[] | Record<string, CriteriaSet>;
  CRITERIA_SETS?: readonly CriteriaSet[];
  defaultCriteriaSetId?: string | ((sheetType: string) => string);
};

const registry = calc as unknown as Registry;

function asList<T>(v: readonly T[] | Record<string, T> | undefined): T[] {
  if (!v) return [];
  return Array.isArray(v) ? [...v] : Object.values(v as Record<string, T>);
}

export class UnknownSheetTypeError extends Error {
  constructor(readonly sheetType: string) {
    super(`sheet type "${sheetType}" is not in the calculation core`);
  }
}

// Until the registry is exported, any exported value shaped like a definition counts.
const exported = Object.values(calc as Record<string, unknown>);
const looseSheetTypes = exported.filter(
  (v): v is SheetTypeDefinition =>
    typeof v === 'object' && v !== null && 'evaluate' in v && 'fields' in v && 'id' in v,
);
const looseCriteriaSets = exported.filter(
  (v): v is CriteriaSet =>
    typeof v === 'object' &&
    v !== null &&
    'version' in v &&
    'id' in v &&
    Array.isArray((v as { values?: unknown }).values),
);

/** The sheet type definition, or an UnknownSheetTypeError. */
export function sheetTypeDefinition(id: string): SheetTypeDefinition {
  const found =
    registry.getSheetType?.(id) ??
    asList(registry.sheetTypes).find((t) => t.id === id) ??
    looseSheetTypes.find((t) => t.id === id);
  if (!found) throw new UnknownSheetTypeError(id);
  return found;
}

/** The criteria sets shipped with the core (seeded as version 1 in the database). */
export function shippedCriteriaSets(): CriteriaSet[] {
  const listed = asList(registry.CRITERIA_SETS ?? registry.criteriaSets ?? registry.shippedCriteriaSets);
  return listed.length > 0 ? listed : looseCriteriaSets;
}

/** The criteria set a new sheet of this type uses unless the engineer picks another. */
export function defaultCriteriaSetId(sheetType: string): string {
  const d = registry.defaultCriteriaSetId;
  if (typeof d === 'function') return d(sheetType);
  if (typeof d === 'string') return d;
  const sets = shippedCriteriaSets();
  if (sets.length === 0) throw new Error('the calculation core ships no criteria sets');
  // Hoist brakes to the hoist set, travel brakes to the travel set, the rest to the general one.
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

/** Current calculation-core version (stored with each evaluation). */
export function coreVersion(): string {
  return calc.CORE_VERSION;
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
  try {
    return sheetTypeDefinition(sheetType).fields.find((f) => f.key === key)?.label ?? key;
  } catch {
    return key;
  }
}

export const isCalcInputError = calc.isCalcInputError;
