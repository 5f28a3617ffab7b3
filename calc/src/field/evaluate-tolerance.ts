import { CalcInputError } from '../core/errors.js';
import type { Dimension, FieldCardLayout, FieldSetting } from '../core/types.js';
import { toDisplay, type UnitSystem } from '../units/display.js';
import type { FieldTolerance, ToleranceVerdict } from './tolerance-types.js';

/**
 * A value typed at the bound in mm and converted to metres can land a few ulps outside it; this
 * slack (relative to the larger of target and band) keeps "exactly on the bound" inside.
 */
const BOUND_SLACK = 1e-9;

/** Lowest and highest accepted value in SI; null for an open side. */
export function toleranceBounds(
  target: number,
  tolerance: FieldTolerance,
): { lower: number | null; upper: number | null } {
  const b = tolerance.band;
  switch (b.kind) {
    case 'absolute':
      return { lower: target - b.minus, upper: target + b.plus };
    case 'relative': {
      const scale = Math.abs(target);
      return { lower: target - b.minus * scale, upper: target + b.plus * scale };
    }
    case 'atLeast':
      return { lower: target, upper: null };
    case 'atMost':
      return { lower: null, upper: target };
  }
}

function checkBand(tolerance: FieldTolerance, errors: { field: string; message: string }[]) {
  const b = tolerance.band;
  if (b.kind !== 'absolute' && b.kind !== 'relative') return;
  for (const side of ['minus', 'plus'] as const) {
    if (!Number.isFinite(b[side]) || b[side] < 0) {
      errors.push({ field: `tolerance.${side}`, message: 'must be a finite number ≥ 0' });
    }
  }
}

/**
 * Evaluates a measured value against target ± tolerance: in or out (bounds included), the
 * deviation measured − target, and both in the field's display unit (`unit`, or the unit system's
 * default for the dimension). Target and measured are SI in the setting's unit.
 * @throws CalcInputError for a non-finite target or measurement, or a negative band.
 * @example evaluateTolerance(0.2, 0.2004, SPRING_LENGTH, 'length').status // 'in'
 */
export function evaluateTolerance(
  target: number,
  measured: number,
  tolerance: FieldTolerance,
  dimension: Dimension,
  system: UnitSystem = 'SI',
  unit?: string,
): ToleranceVerdict {
  const errors: { field: string; message: string }[] = [];
  if (!Number.isFinite(target))
    errors.push({ field: 'target', message: 'must be a finite number' });
  if (!Number.isFinite(measured))
    errors.push({ field: 'measured', message: 'must be a finite number' });
  checkBand(tolerance, errors);
  if (errors.length > 0) throw new CalcInputError(errors);

  const { lower, upper } = toleranceBounds(target, tolerance);
  const span = Math.max(Math.abs(target), Math.abs(lower ?? 0), Math.abs(upper ?? 0));
  const slack = BOUND_SLACK * span;
  const inside =
    (lower === null || measured >= lower - slack) && (upper === null || measured <= upper + slack);
  const deviationSI = measured - target;

  const show = (v: number) => toDisplay(v, dimension, system, unit);
  const unitInfo = show(target);
  // A deviation is a difference: the display offset (°C→°F) must not apply to it.
  const offsetFree = (v: number) => show(v).value - show(0).value;
  return {
    status: inside ? 'in' : 'out',
    deviationSI,
    lowerSI: lower,
    upperSI: upper,
    display: {
      unit: unitInfo.unit,
      label: unitInfo.label,
      deviation: offsetFree(deviationSI),
      lower: lower === null ? null : show(lower).value,
      upper: upper === null ? null : show(upper).value,
    },
  };
}

/** A field setting of an evaluated sheet with the tolerance its field card declares, if any. */
export interface ToleratedSetting extends Omit<FieldSetting, 'tolerance'> {
  tolerance: FieldTolerance | null;
}

/**
 * The tolerance a field setting is measured against: the one the sheet's inputs set for it, else
 * the one its field card declares, else none.
 */
export function settingTolerance(
  setting: FieldSetting,
  card: FieldCardLayout | undefined,
): FieldTolerance | null {
  return setting.tolerance ?? card?.settings[setting.key]?.tolerance ?? null;
}

/** The field settings of an evaluation with their tolerances (`settingTolerance`), in order. */
export function settingsWithTolerance(
  settings: readonly FieldSetting[],
  card: FieldCardLayout,
): ToleratedSetting[] {
  return settings.map((s) => ({ ...s, tolerance: settingTolerance(s, card) }));
}
