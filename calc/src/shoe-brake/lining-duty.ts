import { compute, defineFormula, Derivation } from '../core/step.js';
import { REF } from '../core/references.js';
import { requireRange } from '../units/parse.js';
import type {
  Angle,
  AngularSpeed,
  Area,
  Force,
  Length,
  PV,
  Pressure,
  Speed,
} from '../units/quantities.js';

export const projectedAreaFormula = defineFormula({
  id: 'lining-projected-area',
  label: 'Projected lining area per shoe',
  symbol: 'A_p',
  expression: 'b * D * sin(beta / 2)',
  symbols: {
    b: { text: 'b', dimension: 'length' },
    D: { text: 'D', dimension: 'length' },
    beta: { text: 'β', dimension: 'angle' },
  },
  dimension: 'area',
  reference: REF.pressure,
});

export const meanPressureFormula = defineFormula({
  id: 'mean-pressure',
  label: 'Mean lining pressure (projected area)',
  symbol: 'p_m',
  expression: 'N / A_p',
  symbols: {
    N: { text: 'N', dimension: 'force' },
    A_p: { text: 'A_p', dimension: 'area' },
  },
  dimension: 'pressure',
  reference: REF.pressure,
});

export const rubbingSpeedFormula = defineFormula({
  id: 'rubbing-speed',
  label: 'Rubbing speed at the drum surface',
  symbol: 'v_r',
  expression: 'omega * D / 2',
  symbols: {
    omega: { text: 'ω_b', dimension: 'angularSpeed' },
    D: { text: 'D', dimension: 'length' },
  },
  dimension: 'speed',
  reference: REF.definition,
});

export const pvFormula = defineFormula({
  id: 'pv',
  label: 'Pressure–velocity product',
  symbol: 'pv',
  expression: 'p_m * v_r',
  symbols: {
    p_m: { text: 'p_m', dimension: 'pressure' },
    v_r: { text: 'v_r', dimension: 'speed' },
  },
  dimension: 'pv',
  reference: REF.pv,
});

export interface LiningDutyInput {
  normalForce: Force;
  width: Length;
  drumDiameter: Length;
  /** Contact angle β of one shoe (full arc), rad in (0, π). */
  contactAngle: Angle;
  brakeSpeed: AngularSpeed;
}

export interface LiningDutyResult {
  projectedArea: Area;
  meanPressure: Pressure;
  rubbingSpeed: Speed;
  pv: PV;
}

/**
 * Lining duty of one shoe: projected area A = b·D·sin(β/2), mean pressure p = N/A, rubbing speed
 * v = ω·D/2, and p·v. The projected area follows the machine-design convention for average
 * pressure on cylindrical surfaces (Shigley's MED 8th ed., Table 16-3 note).
 * @example liningDuty({ normalForce: force(10_000), width: length(0.1), drumDiameter: length(0.4),
 *   contactAngle: degrees(90), brakeSpeed: rpm(1000) }).meanPressure // ≈ 353.6 kPa
 */
export function liningDuty(input: LiningDutyInput, d?: Derivation): LiningDutyResult {
  requireRange(input.width, 'width', { min: 0, exclusiveMin: true }, 'm');
  requireRange(input.drumDiameter, 'drumDiameter', { min: 0, exclusiveMin: true }, 'm');
  requireRange(
    input.contactAngle,
    'contactAngle',
    { min: 0, max: Math.PI, exclusiveMin: true, exclusiveMax: true },
    'rad',
  );
  requireRange(input.brakeSpeed, 'brakeSpeed', { min: 0 }, 'rad/s');
  const projectedArea = compute(d, projectedAreaFormula, {
    b: input.width,
    D: input.drumDiameter,
    beta: input.contactAngle,
  });
  const meanPressure = compute(d, meanPressureFormula, {
    N: input.normalForce,
    A_p: projectedArea,
  });
  const rubbingSpeed = compute(d, rubbingSpeedFormula, {
    omega: input.brakeSpeed,
    D: input.drumDiameter,
  });
  const pv = compute(d, pvFormula, { p_m: meanPressure, v_r: rubbingSpeed });
  return { projectedArea, meanPressure, rubbingSpeed, pv };
}
