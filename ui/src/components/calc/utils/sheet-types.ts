import * as calc from '@holdfast/calc';
import type { SheetInputs, SheetTypeDefinition } from '@holdfast/calc';

// The registry lands in calc in stages; reach it through the namespace so the UI keeps building.
const registry = calc as unknown as {
  getSheetType?: (id: string) => SheetTypeDefinition | undefined;
  sheetTypes?: SheetTypeDefinition[] | Record<string, SheetTypeDefinition>;
};

function isSheetType(v: unknown): v is SheetTypeDefinition {
  const t = v as Partial<SheetTypeDefinition> | null;
  return (
    typeof t === 'object' &&
    t !== null &&
    typeof t.id === 'string' &&
    Array.isArray(t.fields) &&
    typeof t.evaluate === 'function'
  );
}

/** All sheet types of the calc registry (or, before it exists, every sheet type calc exports). */
export function listSheetTypes(): SheetTypeDefinition[] {
  const all = registry.sheetTypes;
  if (all) return Array.isArray(all) ? all : Object.values(all);
  return (Object.values(calc) as unknown[]).filter(isSheetType);
}

/** The sheet type with this id, or undefined when the core does not know it. */
export function findSheetType(id: string): SheetTypeDefinition | undefined {
  try {
    return registry.getSheetType?.(id) ?? listSheetTypes().find((t) => t.id === id);
  } catch {
    return undefined;
  }
}

/** Human title of a sheet type id, falling back to the id. */
export function sheetTypeTitle(id: string): string {
  return findSheetType(id)?.title ?? id;
}

/**
 * The stored inputs, with every field the stored revision lacks (one a later core added) as a new
 * sheet starts it: a required number blank for the engineer to enter, never an invented value.
 */
export function withMissingFields(type: SheetTypeDefinition, inputs: SheetInputs): SheetInputs {
  const out: SheetInputs = {};
  for (const f of type.fields) {
    const start = calc.fieldStart(f);
    out[f.key] = start.required ? '' : start.example;
  }
  return { ...out, ...inputs };
}

const warmed = new Set<string>();

/**
 * The first evaluation in a page pays for the unit tables and the JIT (a few hundred ms); later
 * ones take a few ms. Run one throw-away evaluation on the type's demo inputs while the revision
 * is still loading, so the engineer's first keystroke is already fast.
 */
export function warmUpSheetType(id: string): void {
  if (warmed.has(id)) return;
  warmed.add(id);
  const type = findSheetType(id);
  const sets = (calc as unknown as { CRITERIA_SETS?: unknown }).CRITERIA_SETS;
  const criteria = Array.isArray(sets)
    ? sets
    : sets && typeof sets === 'object'
      ? Object.values(sets)
      : [];
  if (!type || criteria.length === 0) return;
  const run = () => {
    for (const set of criteria) {
      try {
        type.evaluate(calc.demoInputs(type), set as Parameters<SheetTypeDefinition['evaluate']>[1]);
        return;
      } catch {
        // A set for another duty may lack a value this type needs: try the next one.
      }
    }
  };
  setTimeout(run, 0);
}
