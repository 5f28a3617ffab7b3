import type { CriteriaSet, CriterionValue, SheetEvaluation, SheetInputs } from '../core/types.js';
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
  const v = criterionIfSet(set, key);
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

/**
 * Keys read from a criteria set during one evaluation. Keyed by the copy of the set that
 * `recordingCriteriaUsed` hands to the sheet, so evaluations never share a record.
 */
const READS = new WeakMap<CriteriaSet, Set<string>>();

/** One value of a criteria set, if the set carries it (no checks): the read is recorded. */
export function criterionIfSet(set: CriteriaSet, key: string): CriterionValue | undefined {
  const v = set.values.find((x) => x.key === key);
  if (v) READS.get(set)?.add(key);
  return v;
}

/**
 * A sheet's evaluate that also lists the criteria values it read (`criteriaUsed`, in the set's
 * order), so a printed sheet shows the values its checks rest on and not the whole set. Every
 * read goes through `criterion`/`criterionIfSet`, so nothing a sheet reads is left off.
 */
export function recordingCriteriaUsed(
  evaluate: (inputs: SheetInputs, criteria: CriteriaSet) => SheetEvaluation,
): (inputs: SheetInputs, criteria: CriteriaSet) => SheetEvaluation {
  return (inputs, criteria) => {
    const view: CriteriaSet = { ...criteria };
    const used = new Set<string>();
    READS.set(view, used);
    const out = evaluate(inputs, view);
    out.criteriaUsed = criteria.values.filter((v) => used.has(v.key)).map((v) => v.key);
    return out;
  };
}
