import type { CriteriaSet, SheetInputs } from '@holdfast/calc';
import { evaluateStoredRecord } from '../calc/calc-engine.js';

export interface FailingCheck {
  id: string;
  label: string;
  value: number;
  limit: number;
  unit: string;
  dimension?: string;
}

/**
 * The checks a revision's stored inputs fail under a criteria set. Inputs the core no longer
 * evaluates count as one failing check, so they are reviewed rather than silently passed.
 */
export function failingChecks(
  sheetType: string,
  inputs: unknown,
  criteria: CriteriaSet,
  onError?: (e: unknown) => void,
): FailingCheck[] {
  try {
    return evaluateStoredRecord(sheetType, inputs as SheetInputs, criteria)
      .checks.filter((c) => !c.pass)
      .map((c) => ({
        id: c.id,
        label: c.label,
        value: c.value,
        limit: c.limit,
        unit: c.unit,
        dimension: c.dimension,
      }));
  } catch (e) {
    onError?.(e);
    return [
      { id: 'evaluation', label: 'Stored inputs no longer evaluate', value: 0, limit: 0, unit: '' },
    ];
  }
}
