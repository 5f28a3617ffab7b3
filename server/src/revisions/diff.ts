import type { CheckResult, ResultValue, SheetEvaluation, SheetInputs } from '@holdfast/calc';
import { canonicalJson } from '@holdfast/shared';

/** Relative change below which a result counts as unchanged (floating-point noise). */
export const MOVE_TOLERANCE = 1e-9;

/** Absolute floor in SI units (a picometre, a piconewton): below it nothing has moved. */
export const MOVE_FLOOR = 1e-12;

export function moved(a: number, b: number, tol = MOVE_TOLERANCE): boolean {
  const diff = Math.abs(a - b);
  return diff > MOVE_FLOOR && diff > tol * Math.max(Math.abs(a), Math.abs(b));
}

export interface ResultDiff {
  key: string;
  label: string;
  unit: string;
  dimension: string;
  from: number | null;
  to: number | null;
  delta: number | null;
  deltaPct: number | null;
}

/** Every result that moved (or exists on one side only), in the order of `to` then `from`. */
export function diffResults(
  from: SheetEvaluation | null,
  to: SheetEvaluation | null,
): ResultDiff[] {
  const a = new Map<string, ResultValue>((from?.results ?? []).map((r) => [r.key, r]));
  const b = new Map<string, ResultValue>((to?.results ?? []).map((r) => [r.key, r]));
  const keys = [...new Set([...b.keys(), ...a.keys()])];
  const out: ResultDiff[] = [];
  for (const key of keys) {
    const x = a.get(key);
    const y = b.get(key);
    if (x && y && !moved(x.value, y.value)) continue;
    const delta = x && y ? y.value - x.value : null;
    out.push({
      key,
      label: (y ?? x)!.label,
      unit: (y ?? x)!.unit,
      dimension: (y ?? x)!.dimension,
      from: x?.value ?? null,
      to: y?.value ?? null,
      delta,
      // A percent change of an absolute temperature depends on where zero is: none is given.
      deltaPct:
        x && y && x.value !== 0 && x.dimension !== 'temperature'
          ? (100 * (y.value - x.value)) / Math.abs(x.value)
          : null,
    });
  }
  return out;
}

export interface CheckDiff {
  id: string;
  label: string;
  from: { value: number; utilisation: number; pass: boolean } | null;
  to: { value: number; utilisation: number; pass: boolean } | null;
}

const checkState = (c: CheckResult | undefined) =>
  c ? { value: c.value, utilisation: c.utilisation, pass: c.pass } : null;

/** Checks whose value, limit or verdict changed. */
export function diffChecks(from: SheetEvaluation | null, to: SheetEvaluation | null): CheckDiff[] {
  const a = new Map((from?.checks ?? []).map((c) => [c.id, c]));
  const b = new Map((to?.checks ?? []).map((c) => [c.id, c]));
  const out: CheckDiff[] = [];
  for (const id of new Set([...b.keys(), ...a.keys()])) {
    const x = a.get(id);
    const y = b.get(id);
    if (x && y && x.pass === y.pass && !moved(x.value, y.value) && !moved(x.limit, y.limit))
      continue;
    out.push({ id, label: (y ?? x)!.label, from: checkState(x), to: checkState(y) });
  }
  return out;
}

/** Inputs whose stored value (with its unit) differs. */
export function diffInputs(from: SheetInputs, to: SheetInputs, label: (key: string) => string) {
  const keys = [...new Set([...Object.keys(to), ...Object.keys(from)])];
  return keys
    .filter((k) => canonicalJson(from[k] ?? null) !== canonicalJson(to[k] ?? null))
    .map((k) => ({ key: k, label: label(k), from: from[k] ?? null, to: to[k] ?? null }));
}
