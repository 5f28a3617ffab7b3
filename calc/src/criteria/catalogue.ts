import type { Dimension, FieldError } from '../core/types.js';

/**
 * What each acceptance criterion is: its dimension, the SI unit its value is stored in, and the
 * range outside which a value means nothing for a brake. Any criteria set (shipped or an admin's
 * own) may only carry these keys, and every value must fall inside its bounds, so a typo such as
 * 1e308, −5 or 0 is refused when it is published rather than when a sheet is submitted.
 *
 * The bounds are deliberately wide: they catch nonsense, not judgement. The governing standard
 * and the maker's data decide the value inside them.
 */
export interface CriterionSpec {
  key: string;
  /** Default wording, for a new set. */
  label: string;
  dimension: Dimension;
  /** SI unit of the stored value ('' for a plain ratio). */
  unit: string;
  /** Smallest meaningful value; `minExclusive` when the bound itself means nothing (0). */
  min: number;
  minExclusive: boolean;
  max: number;
  /** Why the bounds are where they are, shown beside a refused value. */
  why: string;
  /** A set may leave it out (the sheet then uses its own stated default). */
  optional?: boolean;
}

const ratio = (
  key: string,
  label: string,
  min: number,
  max: number,
  why: string,
  minExclusive = false,
): CriterionSpec => ({
  key,
  label,
  dimension: 'dimensionless',
  unit: '',
  min,
  minExclusive,
  max,
  why,
});

export const CRITERION_SPECS: readonly CriterionSpec[] = [
  ratio(
    'torqueFactorSingle',
    'Brake torque ÷ reference torque, one brake',
    0.5,
    5,
    'a single brake below half the reference torque cannot hold; above 5 × it is a typing slip',
  ),
  ratio(
    'torqueFactorMechanical',
    'Brake torque ÷ reference torque, with mechanical control braking',
    0.5,
    5,
    'a brake below half the reference torque cannot hold; above 5 × it is a typing slip',
  ),
  ratio(
    'torqueFactorEachOfTwo',
    'Brake torque ÷ reference torque, each of two brakes',
    0.25,
    5,
    'each of two brakes carries at least a quarter of the reference torque; above 5 × it is a typing slip',
  ),
  ratio(
    'thrusterForceRatio',
    'Thruster force ÷ force needed to release, at least',
    1,
    3,
    'below 1 the thruster cannot release the brake at all',
  ),
  ratio(
    'adhesionLimit',
    'Wheel–rail adhesion allowed for braking',
    0,
    0.5,
    'common practice: wheel–rail adhesion stays well under 0.5; 0 would forbid braking',
    true,
  ),
  {
    key: 'travelStopFraction',
    label: 'Travel stopping distance (ft) ÷ full-load speed (ft/min), at most',
    dimension: 'time',
    unit: 'min',
    min: 0,
    minExclusive: true,
    max: 1,
    why: 'a stop in no distance is impossible; more than a minute of full-load travel is no rule',
  },
  {
    key: 'pvLimit',
    label: 'Lining pressure × rubbing speed limit',
    dimension: 'pv',
    unit: 'Pa m/s',
    min: 0,
    minExclusive: true,
    max: 50e6,
    why: 'no lining works at zero p·v; common practice: lining makers’ p·v limits stay far below 50 MPa·m/s',
  },
  {
    key: 'discSpring.sigmaOMFlatMax',
    label: 'Disc spring |σOM| at flat, at most (static load)',
    dimension: 'pressure',
    unit: 'Pa',
    min: 0,
    minExclusive: true,
    max: 5e9,
    why: 'common practice: the tensile strength of spring steels stays well below 5 000 N/mm²',
    optional: true,
  },
];

/** Keys every criteria set must carry, so any sheet type can be checked against it. */
export const REQUIRED_CRITERIA: readonly string[] = CRITERION_SPECS.filter((s) => !s.optional).map(
  (s) => s.key,
);

const BY_KEY = new Map(CRITERION_SPECS.map((s) => [s.key, s]));

/** The declaration of a criterion key, or undefined when no sheet knows it. */
export function criterionSpec(key: string): CriterionSpec | undefined {
  return BY_KEY.get(key);
}

/** The reason a value is outside its criterion's bounds, or undefined when it fits. */
export function criterionValueProblem(spec: CriterionSpec, value: number): string | undefined {
  const range = `${spec.minExclusive ? 'above' : 'at least'} ${spec.min} and at most ${spec.max}${spec.unit ? ` ${spec.unit}` : ''}`;
  if (typeof value !== 'number' || !Number.isFinite(value))
    return `must be a finite number, ${range}`;
  const low = spec.minExclusive ? value <= spec.min : value < spec.min;
  if (low || value > spec.max) return `must be ${range} (${spec.why})`;
  return undefined;
}

/**
 * Every problem with a list of criterion values, with paths relative to the list
 * (`3.value`, `0.key`, `2.unit`): unknown or repeated keys, a unit other than the declared one
 * (an empty unit means "the declared one"), and values outside their bounds.
 */
export function criteriaValueProblems(
  values: readonly { key: string; value: number; unit: string }[],
): FieldError[] {
  const errors: FieldError[] = [];
  const seen = new Set<string>();
  values.forEach((v, i) => {
    const spec = criterionSpec(v.key);
    if (!spec) {
      errors.push({ field: `${i}.key`, message: `"${v.key}" is not a criterion any sheet uses` });
      return;
    }
    if (seen.has(v.key)) errors.push({ field: `${i}.key`, message: `"${v.key}" is repeated` });
    seen.add(v.key);
    if (v.unit !== '' && v.unit !== spec.unit) {
      errors.push({
        field: `${i}.unit`,
        message: `${spec.label} is stored in ${spec.unit || 'a plain ratio (no unit)'}, not "${v.unit}"`,
      });
    }
    const problem = criterionValueProblem(spec, v.value);
    if (problem) errors.push({ field: `${i}.value`, message: problem });
  });
  return errors;
}
