import type { CriteriaSet, SheetInputs, SheetTypeDefinition } from '@holdfast/calc';
import { isQuantity } from './units';

/** An input that moves a check, and how much: relative change of utilisation per 1 % of input. */
export interface CheckDriver {
  key: string;
  label: string;
  /** d(utilisation)/utilisation ÷ d(input)/input near the current inputs (elasticity). */
  effect: number;
}

/**
 * The inputs that drive one check, found by asking the calc core itself: each numeric input is
 * nudged by 1 % and the check's utilisation is read again. Inputs that do not move it are left
 * out; the rest come strongest first. A few dozen evaluations at ~0.2 ms each, run on demand.
 */
export function checkDrivers(
  sheetType: SheetTypeDefinition,
  inputs: SheetInputs,
  criteria: CriteriaSet,
  checkId: string,
  limit = 6,
): CheckDriver[] {
  const utilisationOf = (x: SheetInputs): number | null => {
    try {
      return (
        sheetType.evaluate(x, criteria).checks.find((c) => c.id === checkId)?.utilisation ?? null
      );
    } catch {
      return null;
    }
  };
  const base = utilisationOf(inputs);
  if (base === null || base === 0) return [];
  const out: CheckDriver[] = [];
  for (const field of sheetType.fields) {
    const v = inputs[field.key];
    let nudged: SheetInputs[string] | undefined;
    if (isQuantity(v) && v.value !== 0) nudged = { ...v, value: v.value * 1.01 };
    else if (typeof v === 'number' && v !== 0) nudged = v * 1.01;
    if (nudged === undefined) continue;
    const u = utilisationOf({ ...inputs, [field.key]: nudged });
    if (u === null) continue;
    const effect = (u - base) / base / 0.01;
    if (Math.abs(effect) > 1e-4) out.push({ key: field.key, label: field.label, effect });
  }
  return out.sort((a, b) => Math.abs(b.effect) - Math.abs(a.effect)).slice(0, limit);
}
