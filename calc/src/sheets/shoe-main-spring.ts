import type { CheckResult } from '../core/types.js';
import { compute, type Derivation } from '../core/step.js';
import { limitCheck } from '../core/limit-check.js';
import { CalcInputError, isCalcInputError } from '../core/errors.js';
import {
  compressionSpring,
  END_TYPES,
  type SpringEndType,
} from '../helical-spring/compression-spring.js';
import { releasedSpringForceFormula } from '../release/release.js';
import * as q from '../units/quantities.js';
import { choice, num, qty } from './field-builders.js';
import { makeCheck } from './checks.js';
import type { ShoeInputs } from './shoe-brake-fields.js';

const B = 'brake';
const SRC = "Budynas & Nisbett, Shigley's MED 10th ed., ch. 10";

/** Geometry and material of the main (helical compression) spring. */
export const MAIN_SPRING_FIELDS = [
  qty(B, 'springWireDiameter', 'Main spring wire diameter', 'd', 'length', 10, 'mm', 'in', {
    min: 0,
    exclusiveMin: true,
  }),
  qty(
    B,
    'springMeanDiameter',
    'Main spring mean coil diameter',
    'D_m',
    'length',
    52.5,
    'mm',
    'in',
    {
      min: 0,
      exclusiveMin: true,
    },
  ),
  num(B, 'springActiveCoils', 'Main spring active coils', 'N_a', 17, { min: 1, max: 200 }),
  choice(
    B,
    'springEndType',
    'Main spring ends',
    'squared-ground',
    Object.entries(END_TYPES).map(([value, e]) => ({ value, label: e.label })),
    "Total coils and solid length by end type: Shigley's MED 10th ed., Table 10-1.",
  ),
  qty(B, 'springShearModulus', 'Main spring shear modulus', 'G', 'pressure', 79300, 'MPa', 'psi', {
    min: 1000,
    help: 'About 79 GPa for spring steels (from memory; the spring maker’s data governs).',
  }),
  qty(
    B,
    'springElasticModulus',
    'Main spring elastic modulus',
    'E',
    'pressure',
    206000,
    'MPa',
    'psi',
    {
      min: 1000,
    },
  ),
  num(B, 'springEndFixity', 'Main spring end-condition constant for buckling', 'α', 0.5, {
    min: 0.1,
    max: 3,
    help: "0.5 both ends on flat parallel plates, 0.707 one pivoted, 1 both pivoted, 2 one end free (Shigley's MED 10th ed., Table 10-2, from memory).",
  }),
  qty(
    B,
    'springAllowableShear',
    "Main spring permissible shear stress (spring maker's data)",
    'τ_perm',
    'pressure',
    600,
    'MPa',
    'psi',
    { min: 1 },
  ),
] as const;

/** Tolerance on the rate computed from the geometry against the rate entered (common practice). */
const RATE_TOLERANCE = 0.05;

/**
 * The main spring at the highest setting with the shoes lifted (the highest force it sees):
 * stress, margin to solid and stress when pressed solid, buckling, and the rate from the geometry
 * against the rate the sheet uses (section 'brake').
 */
export function shoeMainSpring(
  v: ShoeInputs,
  clearance: number,
  d: Derivation,
): { checks: CheckResult[] } {
  d.section = 'brake';
  const Fmax = compute(
    d,
    releasedSpringForceFormula,
    { F_s: v.springForceMax, k: v.springRate, e: clearance, r_s: v.springTravelRatio },
    {
      id: 'spring-force-highest',
      label: 'Main spring force at the highest setting with the shoes lifted',
      symbol: 'F_s,max,rel',
      names: { F_s: 'F_s,max' },
    },
  );
  const s = withSheetFields(() =>
    compressionSpring(
      {
        wireDiameter: q.length(v.springWireDiameter),
        meanDiameter: q.length(v.springMeanDiameter),
        activeCoils: v.springActiveCoils,
        endType: v.springEndType as SpringEndType,
        freeLength: q.length(v.springFreeLength),
        shearModulus: q.pressure(v.springShearModulus),
        elasticModulus: q.pressure(v.springElasticModulus),
        endFixity: q.ratio(v.springEndFixity),
        maxForce: Fmax,
        allowableShear: q.pressure(v.springAllowableShear),
        allowableShearSolid: q.pressure(v.springAllowableShear),
      },
      d,
    ),
  );
  const rateDev = Math.abs(s.rate / v.springRate - 1);
  const checks = [
    ...s.checks,
    limitCheck({
      id: 'spring-rate-agrees',
      label: 'Spring rate from the geometry agrees with the rate used (deviation ≤ 5 %)',
      value: rateDev,
      limit: RATE_TOLERANCE,
      dimension: 'dimensionless',
      kind: 'max',
      source: `${SRC}, Eq. (10-9); tolerance common practice`,
    }),
  ];
  return { checks: checks.map((c) => makeCheck({ ...c, section: 'brake' })) };
}

/** The formula's field names as the sheet declares them. */
const FIELD_OF: Record<string, string> = {
  wireDiameter: 'springWireDiameter',
  meanDiameter: 'springMeanDiameter',
  activeCoils: 'springActiveCoils',
  endType: 'springEndType',
  freeLength: 'springFreeLength',
  shearModulus: 'springShearModulus',
  elasticModulus: 'springElasticModulus',
  endFixity: 'springEndFixity',
  allowableShear: 'springAllowableShear',
  allowableShearSolid: 'springAllowableShear',
};

function withSheetFields<T>(f: () => T): T {
  try {
    return f();
  } catch (e) {
    if (!isCalcInputError(e)) throw e;
    throw new CalcInputError(e.fields.map((x) => ({ ...x, field: FIELD_OF[x.field] ?? x.field })));
  }
}
