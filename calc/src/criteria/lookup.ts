import type { CriteriaSet, CriterionValue } from '../core/types.js';
import { CalcInputError } from '../core/errors.js';
import { CRITERIA_SETS } from './sets.js';

/** A shipped criteria set by id (admins may keep their own sets elsewhere; they share this shape). */
export function getCriteriaSet(id: string): CriteriaSet | undefined {
  return CRITERIA_SETS.find((s) => s.id === id);
}

/**
 * One value of a criteria set. A missing or non-finite value is an input error on the field
 * `criteria.<key>`, so an admin-edited set with a gap fails clearly.
 */
export function criterion(set: CriteriaSet, key: string): CriterionValue {
  const v = set.values.find((x) => x.key === key);
  if (!v || typeof v.value !== 'number' || !Number.isFinite(v.value)) {
    throw new CalcInputError([
      { field: `criteria.${key}`, message: `criteria set "${set.id}" has no valid value "${key}"` },
    ]);
  }
  return v;
}
