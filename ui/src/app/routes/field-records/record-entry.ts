import type { FieldCheckInput, FieldForm } from '@holdfast/shared';
import type { InputValue } from '@holdfast/calc';
import type { CheckDraft } from '../../../features/field-records/components/check-items';
import { readSI } from '../../../features/field-records/components/measurement-entry';

/** The hour meter as typed: null when left empty, undefined when it is not a number ≥ 0. */
export function readHours(value: InputValue | undefined): number | null | undefined {
  if (value === undefined || value === '') return null;
  return typeof value === 'number' && Number.isFinite(value) && value >= 0 ? value : undefined;
}

/** A count as typed: null when left empty, undefined when it is not a whole number 0-1000. */
function readCount(value: InputValue | undefined): number | null | undefined {
  if (value === undefined || value === '') return null;
  return typeof value === 'number' && Number.isInteger(value) && value >= 0 && value <= 1000
    ? value
    : undefined;
}

export function buildChecks(form: FieldForm, drafts: Record<string, CheckDraft>) {
  const checks: FieldCheckInput[] = [];
  const errors: Record<string, string> = {};
  for (const c of form.checks) {
    const d = drafts[c.key];
    if (!d?.result) {
      errors[`checks.${c.key}`] = 'Answer this check';
      continue;
    }
    const v = c.hasValue ? readSI(d.value, 'length') : { kind: 'empty' as const };
    if (v.kind === 'invalid') errors[`checks.${c.key}.value`] = 'Enter a number';
    const cycles = readCount(d.cycles);
    if (cycles === undefined) errors[`checks.${c.key}.cycles`] = 'Enter a whole number, 0 to 1000';
    checks.push({
      key: c.key,
      result: d.result,
      value: v.kind === 'value' ? v.si : null,
      cycles: cycles ?? null,
      note: '',
    });
  }
  return { checks, errors };
}
