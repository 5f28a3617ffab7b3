import { compute, Derivation } from '../core/step.js';
import { CalcInputError, requireField } from '../core/errors.js';
import { limitCheck, type LimitCheck } from '../core/limit-check.js';
import { requireRange } from '../units/parse.js';
import type { Force, Length, Pressure, Ratio, Stiffness } from '../units/quantities.js';
import {
  bergstrasserFormula,
  criticalDeflectionFormula,
  criticalFreeLengthFormula,
  helicalRateFormula,
  shearStressFormula,
  solidForceFormula,
  solidLengthFormula,
  springIndexFormula,
  totalCoilsFormula,
  wahlFormula,
} from './formulas.js';

/** End types of Shigley's MED 10th ed., Table 10-1: extra total coils N_e and solid-length term e_s. */
export const END_TYPES = {
  plain: { label: 'Plain ends', extraCoils: 0, solidExtra: 1 },
  'plain-ground': { label: 'Plain and ground ends', extraCoils: 1, solidExtra: 0 },
  squared: { label: 'Squared (closed) ends', extraCoils: 2, solidExtra: 1 },
  'squared-ground': { label: 'Squared and ground ends', extraCoils: 2, solidExtra: 0 },
} as const;
export type SpringEndType = keyof typeof END_TYPES;

/**
 * End-condition constant α for buckling (Shigley's MED 10th ed., Table 10-2, from memory): both ends on
 * flat parallel surfaces (fixed) 0.5; one fixed, one pivoted 0.707; both pivoted 1; one end free 2.
 */
export const END_FIXITY = { fixedFixed: 0.5, fixedPivoted: 0.707, pivotedPivoted: 1, fixedFree: 2 };

export interface CompressionSpringInput {
  wireDiameter: Length;
  /** Mean coil diameter D (outer diameter − d), m. */
  meanDiameter: Length;
  activeCoils: number;
  endType: SpringEndType;
  freeLength: Length;
  /** Shear modulus G and Young's modulus E of the wire, Pa. */
  shearModulus: Pressure;
  elasticModulus: Pressure;
  /** Buckling end-condition constant α (END_FIXITY), > 0. */
  endFixity: Ratio;
  /** Highest working force: the spring at the top of its adjustable range (plus release travel), N. */
  maxForce: Force;
  /** Permissible shear stress at the highest working force (maker's data or criteria), Pa. */
  allowableShear: Pressure;
  /** Permissible shear stress when pressed solid (often the torsional yield strength), Pa. */
  allowableShearSolid: Pressure;
  /** 'bergstrasser' (default; Shigley, EN 13906-1) or 'wahl'. */
  correction?: 'bergstrasser' | 'wahl';
  /** Fractional overrun to solid ξ: F_solid ≥ (1 + ξ)·F_max; default 0.15 (Shigley's MED 10th ed., §10-8, from memory). */
  overrun?: Ratio;
}

export interface CompressionSpringResult {
  index: Ratio;
  correction: Ratio;
  rate: Stiffness;
  totalCoils: Ratio;
  solidLength: Length;
  solidForce: Force;
  shearStress: Pressure;
  shearStressSolid: Pressure;
  criticalFreeLength: Length;
  /** Present when the free length exceeds the absolutely stable length. */
  criticalDeflection?: Length;
  checks: LimitCheck[];
}

function validate(s: CompressionSpringInput): void {
  const pos = { min: 0, exclusiveMin: true };
  requireRange(s.wireDiameter, 'wireDiameter', pos, 'm');
  requireRange(s.meanDiameter, 'meanDiameter', pos, 'm');
  // Below C ≈ 3 the correction factors lose meaning and the spring cannot be coiled.
  requireField(
    s.meanDiameter / s.wireDiameter >= 3,
    'meanDiameter',
    `spring index D/d must be at least 3 (got ${(s.meanDiameter / s.wireDiameter).toPrecision(3)})`,
  );
  requireRange(s.activeCoils, 'activeCoils', { min: 1 });
  if (!(s.endType in END_TYPES))
    throw new CalcInputError([{ field: 'endType', message: `unknown end type "${s.endType}"` }]);
  requireRange(s.freeLength, 'freeLength', pos, 'm');
  requireRange(s.shearModulus, 'shearModulus', pos, 'Pa');
  requireRange(
    s.elasticModulus,
    'elasticModulus',
    { min: s.shearModulus, exclusiveMin: true },
    'Pa',
  );
  requireRange(s.endFixity, 'endFixity', pos);
  requireRange(s.maxForce, 'maxForce', { min: 0 }, 'N');
  requireRange(s.allowableShear, 'allowableShear', pos, 'Pa');
  requireRange(s.allowableShearSolid, 'allowableShearSolid', pos, 'Pa');
  requireRange(s.overrun ?? 0.15, 'overrun', { min: 0, max: 1 });
}

/**
 * Static check of a helical compression spring (the main brake spring): index C = D/d; stress
 * correction K_B = (4C+2)/(4C−3) (or Wahl); τ = K·8FD/(πd³) at the highest working force and when
 * pressed solid; rate k = d⁴G/(8D³N_a); total coils and solid length by end type; buckling —
 * absolutely stable when L_0 ≤ (πD/α)·√(2(E−G)/(2G+E)), otherwise the working deflection must
 * stay below y_cr = L_0·C′₁·[1 − √(1 − C′₂/λ²)], λ = αL_0/D.
 *
 * Checks: τ ≤ allowable at F_max; τ_solid ≤ allowable at solid; F_solid ≥ (1 + ξ)·F_max (the
 * working range stays clear of coil clash); no buckling. Free length must exceed solid length.
 * Source: Budynas & Nisbett, Shigley's MED 10th ed., ch. 10 (equation numbers in formulas.ts).
 * @example compressionSpring({ wireDiameter: length(0.0025), meanDiameter: length(0.0285),
 *   activeCoils: 13, endType: 'plain-ground', freeLength: length(0.1628),
 *   shearModulus: pressure(81e9), elasticModulus: pressure(210.6e9), endFixity: ratio(0.5),
 *   maxForce: force(130), allowableShear: pressure(871.2e6), allowableShearSolid: pressure(871.2e6),
 * }).rate // ≈ 1314 N/m (Shigley's MED 10th ed., Problem 10-3)
 */
export function compressionSpring(
  s: CompressionSpringInput,
  dv?: Derivation,
): CompressionSpringResult {
  validate(s);
  const d = s.wireDiameter;
  const D = s.meanDiameter;
  const index = compute(dv, springIndexFormula, { D, d });
  const correction = compute(dv, s.correction === 'wahl' ? wahlFormula : bergstrasserFormula, {
    C: index,
  });
  const rate = compute(dv, helicalRateFormula, { d, G: s.shearModulus, D, N_a: s.activeCoils });
  const end = END_TYPES[s.endType];
  const totalCoils = compute(dv, totalCoilsFormula, { N_a: s.activeCoils, n_e: end.extraCoils });
  const solidLength = compute(dv, solidLengthFormula, { d, N_t: totalCoils, s_e: end.solidExtra });
  if (!(s.freeLength > solidLength))
    throw new CalcInputError([
      {
        field: 'freeLength',
        message: `must exceed the solid length ${(solidLength * 1e3).toPrecision(4)} mm`,
      },
    ]);
  const solidForce = compute(dv, solidForceFormula, {
    k: rate,
    L_0: s.freeLength,
    L_s: solidLength,
  });
  const shearStress = compute(dv, shearStressFormula, { K: correction, F: s.maxForce, D, d });
  const shearStressSolid = compute(
    dv,
    shearStressFormula,
    { K: correction, F: solidForce, D, d },
    {
      id: 'spring-shear-stress-solid',
      label: 'Corrected shear stress when pressed solid',
      symbol: 'τ_solid',
    },
  );
  const EG = { E: s.elasticModulus, G: s.shearModulus };
  const criticalFreeLength = compute(dv, criticalFreeLengthFormula, {
    D,
    alpha: s.endFixity,
    ...EG,
  });
  const SRC = "Budynas & Nisbett, Shigley's MED 10th ed., ch. 10";
  const xi = s.overrun ?? 0.15;
  const checks: LimitCheck[] = [
    limitCheck({
      id: 'spring-stress-working',
      label: 'Spring shear stress at the highest working force ≤ permissible',
      value: shearStress,
      limit: s.allowableShear,
      dimension: 'pressure',
      kind: 'max',
      source: `${SRC}, Eq. (10-7); limit: maker's data or criteria (user input)`,
    }),
    limitCheck({
      id: 'spring-stress-solid',
      label: 'Spring shear stress when pressed solid ≤ permissible',
      value: shearStressSolid,
      limit: s.allowableShearSolid,
      dimension: 'pressure',
      kind: 'max',
      source: `${SRC}, Eq. (10-7); limit: maker's data or criteria (user input)`,
    }),
    limitCheck({
      id: 'spring-solid-margin',
      label: `Force to solid ≥ (1 + ξ) × highest working force (ξ = ${xi})`,
      value: solidForce,
      limit: (1 + xi) * s.maxForce,
      dimension: 'force',
      kind: 'min',
      source: `${SRC}, §10-8 design guidance ξ ≥ 0.15 (from memory)`,
    }),
  ];
  let criticalDeflection: Length | undefined;
  if (s.freeLength <= criticalFreeLength) {
    checks.push(
      limitCheck({
        id: 'spring-buckling',
        label: 'Free length ≤ absolutely stable length (no buckling)',
        value: s.freeLength,
        limit: criticalFreeLength,
        dimension: 'length',
        kind: 'max',
        source: `${SRC}, Eq. (10-13) (from memory)`,
      }),
    );
  } else {
    criticalDeflection = compute(dv, criticalDeflectionFormula, {
      L_0: s.freeLength,
      D,
      alpha: s.endFixity,
      ...EG,
    });
    checks.push(
      limitCheck({
        id: 'spring-buckling',
        label: 'Deflection at the highest working force < buckling deflection',
        value: s.maxForce / rate,
        limit: criticalDeflection,
        dimension: 'length',
        kind: 'max',
        strict: true,
        source: `${SRC}, Eqs. (10-10) to (10-12) (from memory)`,
      }),
    );
  }
  return {
    index,
    correction,
    rate,
    totalCoils,
    solidLength,
    solidForce,
    shearStress,
    shearStressSolid,
    criticalFreeLength,
    criticalDeflection,
    checks,
  };
}
