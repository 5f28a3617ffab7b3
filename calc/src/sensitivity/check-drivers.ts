import { isCalcInputError } from '../core/errors.js';
import type { CriteriaSet, InputValue, SheetInputs, SheetTypeDefinition } from '../core/types.js';

/** An input that moves a check, and how much. */
export interface CheckDriver {
  /** The field's key. */
  key: string;
  /** The field's label, as the sheet declares it. */
  label: string;
  /**
   * Elasticity of the check's utilisation to the input near the current inputs:
   * (Δu / u) ÷ (Δx / x) for a 1 % change of x. +1 means 1 % more input, 1 % more utilisation.
   */
  effect: number;
}

/** Relative step of the finite difference: 1 % of the input. */
const STEP = 0.01;
/** Effects smaller than this (in magnitude) are noise from rounding, not a driver. */
const NEGLIGIBLE = 1e-4;
/** Effects within this relative difference rank as equal (finite-difference rounding). */
const TIE = 1e-6;

function nudged(v: InputValue | undefined, factor: number): InputValue | undefined {
  if (typeof v === 'number') return v !== 0 && Number.isFinite(v) ? v * factor : undefined;
  if (typeof v === 'object' && v !== null && typeof v.value === 'number')
    return v.value !== 0 && Number.isFinite(v.value)
      ? { ...v, value: v.value * factor }
      : undefined;
  return undefined;
}

/**
 * Ranks the numeric inputs of `fields` by how strongly they move `utilisationOf`: each input is
 * nudged up by 1 % (down by 1 % when the higher value is refused, e.g. at its upper bound) and the
 * relative change of the utilisation is divided by the relative change of the input. Choices,
 * flags, zero and missing inputs are skipped; so is an input whose nudge is refused both ways, and
 * one whose effect is negligible. Strongest first (by magnitude; equal ones in field order), at
 * most `limit`.
 *
 * `utilisationOf` returns null when the inputs cannot be evaluated. Pure: no clock, no I/O.
 */
export function rankDrivers(
  fields: readonly { key: string; label: string }[],
  inputs: SheetInputs,
  utilisationOf: (inputs: SheetInputs) => number | null,
  limit = 6,
): CheckDriver[] {
  const base = utilisationOf(inputs);
  if (base === null || base === 0 || !Number.isFinite(base)) return [];
  const out: (CheckDriver & { order: number })[] = [];
  for (const [order, field] of fields.entries()) {
    for (const factor of [1 + STEP, 1 - STEP]) {
      const x = nudged(inputs[field.key], factor);
      if (x === undefined) break;
      const u = utilisationOf({ ...inputs, [field.key]: x });
      if (u === null || !Number.isFinite(u)) continue;
      const effect = (u - base) / base / (factor - 1);
      if (Math.abs(effect) > NEGLIGIBLE)
        out.push({ key: field.key, label: field.label, effect, order });
      break;
    }
  }
  // Factors of a product all have the same elasticity but for rounding: such ties keep the
  // sheet's own field order (the order the engineer reads them in).
  const stronger = (a: CheckDriver, b: CheckDriver) => {
    const d = Math.abs(b.effect) - Math.abs(a.effect);
    return Math.abs(d) > TIE * Math.max(Math.abs(a.effect), Math.abs(b.effect)) ? d : 0;
  };
  return out
    .sort((a, b) => stronger(a, b) || a.order - b.order)
    .slice(0, Math.max(0, limit))
    .map(({ key, label, effect }) => ({ key, label, effect }));
}

/**
 * The inputs that drive one check of a sheet (see `rankDrivers`), found by evaluating the sheet
 * itself: one evaluation per numeric input, a few dozen at well under a millisecond each, so the
 * caller runs it on demand rather than on every key. An unknown check, or inputs the sheet refuses,
 * give an empty list.
 */
export function checkDrivers(
  sheetType: Pick<SheetTypeDefinition, 'fields' | 'evaluate'>,
  inputs: SheetInputs,
  criteria: CriteriaSet,
  checkId: string,
  limit = 6,
): CheckDriver[] {
  const utilisationOf = (x: SheetInputs): number | null => {
    try {
      const check = sheetType.evaluate(x, criteria).checks.find((c) => c.id === checkId);
      return check?.utilisation ?? null;
    } catch (e) {
      // Refused inputs (a nudge past a bound) are expected; anything else is a fault to see.
      if (isCalcInputError(e)) return null;
      throw e;
    }
  };
  return rankDrivers(sheetType.fields, inputs, utilisationOf, limit);
}
