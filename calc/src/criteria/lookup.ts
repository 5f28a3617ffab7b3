import type { CriteriaSet, CriterionValue } from '../core/types.js';
import { CalcInputError } from '../core/errors.js';
import { CRITERIA_SETS } from './sets.js';
import { criterionSpec, criterionValueProblem } from './catalogue.js';

/** A shipped criteria set by id (admins may keep their own sets elsewhere; they share this shape). */
export function getCriteriaSet(id: string): CriteriaSet | undefined {
  return CRITERIA_SETS.find((s) => s.id === id);
}

/**
 * One value of a criteria set. A missing value, or one outside the criterion's declared bounds
 * (see catalogue.ts), is an input error on the field `criteria.<key>`, so an admin-edited set with
 * a gap or a nonsense value fails clearly instead of producing a result.
 */
export function criterion(set: CriteriaSet, key: string): CriterionValue {
  const v = set.values.find((x) => x.key === key);
  if (!v || typeof v.value !== 'number' || !Number.isFinite(v.value)) {
    throw new CalcInputError([
      { field: `criteria.${key}`, message: `criteria set "${set.id}" has no valid value "${key}"` },
    ]);
  }
  const spec = criterionSpec(key);
  const problem = spec && criterionValueProblem(spec, v.value);
  if (problem) {
    throw new CalcInputError([
      {
        field: `criteria.${key}`,
        message: `criteria set "${set.id}" version ${set.version}: "${spec.label}" ${problem}`,
      },
    ]);
  }
  return v;
}
