import {
  evaluateTolerance,
  toSI,
  type Dimension,
  type FieldTolerance,
  type InputValue,
  type ToleranceVerdict,
} from '@holdfast/calc';
import type { FieldMeasurementInput, FieldTarget } from '@holdfast/shared';
import { isQuantity } from '../../../components/calc/utils/units';
import { readNumber } from '../../../components/calc/utils/number-entry';

/** What the fitter typed for one target: as found, as left (each a quantity or raw text), why. */
export interface MeasurementDraft {
  asFound?: InputValue;
  asLeft?: InputValue;
  reason: string;
}

export type ReadValue =
  { kind: 'empty' } | { kind: 'value'; si: number } | { kind: 'invalid'; message: string };

/** A typed value in SI, or why it is not one yet. */
export function readSI(value: InputValue | undefined, dimension: string): ReadValue {
  if (value === undefined || value === '') return { kind: 'empty' };
  if (!isQuantity(value) || !Number.isFinite(value.value)) {
    // Text the field could not read ("1,2" without the comma format): say why, as the editor does.
    const entry = typeof value === 'string' ? readNumber(value, 'point') : null;
    const why = entry && (entry.kind === 'invalid' || entry.kind === 'incomplete');
    return { kind: 'invalid', message: why ? entry.message : 'Enter a number' };
  }
  try {
    const si = toSI(value.value, value.unit, dimension as Dimension);
    // Lengths, forces, angles and absolute temperatures are never below zero.
    if (si < 0) return { kind: 'invalid', message: 'A reading cannot be negative' };
    return { kind: 'value', si };
  } catch {
    return { kind: 'invalid', message: 'Enter a number' };
  }
}

/** In or out of the target's tolerance; null without a value or a tolerance. */
export function verdictFor(target: FieldTarget, value: ReadValue): ToleranceVerdict | null {
  return judged(target, target, value);
}

/**
 * An as-found reading against the in-service limit where the target has one (the reserve stroke
 * down to the sheet's minimum: wear, not a setting error), else against the setting's tolerance.
 * The server judges the stored record the same way.
 */
export function asFoundVerdictFor(target: FieldTarget, value: ReadValue): ToleranceVerdict | null {
  return judged(target, target.inService ?? target, value);
}

function judged(
  target: FieldTarget,
  basis: { value: number; tolerance: FieldTarget['tolerance'] },
  value: ReadValue,
): ToleranceVerdict | null {
  if (value.kind !== 'value' || !basis.tolerance) return null;
  return evaluateTolerance(
    basis.value,
    value.si,
    basis.tolerance as FieldTolerance,
    target.dimension as Dimension,
  );
}

/**
 * The measurements of the form as the API takes them, and the field errors that stop a save:
 * a value that is not a number, an as-left value out of tolerance without a reason.
 */
export function buildMeasurements(
  targets: readonly FieldTarget[],
  drafts: Readonly<Record<string, MeasurementDraft>>,
): { measurements: FieldMeasurementInput[]; errors: Record<string, string> } {
  const measurements: FieldMeasurementInput[] = [];
  const errors: Record<string, string> = {};
  for (const t of targets) {
    const d = drafts[t.settingKey];
    if (!d) continue;
    const found = readSI(d.asFound, t.dimension);
    const left = readSI(d.asLeft, t.dimension);
    if (found.kind === 'invalid') errors[`${t.settingKey}.asFound`] = found.message;
    if (left.kind === 'invalid') errors[`${t.settingKey}.asLeft`] = left.message;
    if (found.kind === 'empty' && left.kind === 'empty') continue;
    if (verdictFor(t, left)?.status === 'out' && d.reason.trim() === '') {
      errors[`${t.settingKey}.reason`] = 'Out of tolerance as left: say why';
    }
    measurements.push({
      settingKey: t.settingKey,
      asFound: found.kind === 'value' ? found.si : null,
      asLeft: left.kind === 'value' ? left.si : null,
      reason: d.reason.trim(),
    });
  }
  return { measurements, errors };
}
