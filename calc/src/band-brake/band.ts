import { compute, defineFormula, Derivation } from '../core/step.js';
import { REF } from '../core/references.js';
import { requireRange } from '../units/parse.js';
import type { Angle, Force, Length, Pressure, Ratio, Torque } from '../units/quantities.js';

export const bandTightSideFormula = defineFormula({
  id: 'band-tight-side',
  label: 'Tight-side band force at the allowed pressure',
  symbol: 'P_1',
  expression: 'p_max * b * r',
  symbols: {
    p_max: { text: 'p_max', dimension: 'pressure' },
    b: { text: 'b', dimension: 'length' },
    r: { text: 'r', dimension: 'length' },
  },
  dimension: 'force',
  reference: REF.band,
});

export const bandSlackSideFormula = defineFormula({
  id: 'band-slack-side',
  label: 'Slack-side band force',
  symbol: 'P_2',
  expression: 'P_1 / exp(f * phi)',
  symbols: {
    P_1: { text: 'P_1', dimension: 'force' },
    f: { text: 'f', dimension: 'dimensionless' },
    phi: { text: 'φ', dimension: 'angle' },
  },
  dimension: 'force',
  reference: REF.band,
});

export const bandTorqueFormula = defineFormula({
  id: 'band-torque',
  label: 'Band brake torque',
  symbol: 'T',
  expression: '(P_1 - P_2) * r',
  symbols: {
    P_1: { text: 'P_1', dimension: 'force' },
    P_2: { text: 'P_2', dimension: 'force' },
    r: { text: 'r', dimension: 'length' },
  },
  dimension: 'torque',
  reference: REF.band,
});

/**
 * Band brake: tight side P1 = p_max·b·r (pressure highest at the tight end), slack side
 * P2 = P1/e^{fφ}, torque T = (P1 − P2)·r.
 *
 * Source: Budynas & Nisbett, Shigley's MED 8th ed., §16-6; Mott, Machine Elements in Mechanical
 * Design 4th ed., Example Problem 22-10 (p_max 25 psi, f 0.25, r 6 in, φ 225°, b 2 in →
 * P1 300 lb, P2 112 lb, T ≈ 1126 lb·in).
 * @param maxPressure p_max, Pa (> 0); @param width b, m (> 0); @param radius r, m (> 0)
 * @param f friction coefficient (0, 1]; @param wrap φ, rad in (0, 4π]
 */
export function bandBrake(
  maxPressure: Pressure,
  width: Length,
  radius: Length,
  f: Ratio,
  wrap: Angle,
  d?: Derivation,
): { tight: Force; slack: Force; torque: Torque } {
  requireRange(maxPressure, 'maxPressure', { min: 0, exclusiveMin: true }, 'Pa');
  requireRange(width, 'width', { min: 0, exclusiveMin: true }, 'm');
  requireRange(radius, 'radius', { min: 0, exclusiveMin: true }, 'm');
  requireRange(f, 'f', { min: 0, max: 1, exclusiveMin: true });
  requireRange(wrap, 'wrap', { min: 0, max: 4 * Math.PI, exclusiveMin: true }, 'rad');
  const tight = compute(d, bandTightSideFormula, { p_max: maxPressure, b: width, r: radius });
  const slack = compute(d, bandSlackSideFormula, { P_1: tight, f, phi: wrap });
  const torque = compute(d, bandTorqueFormula, { P_1: tight, P_2: slack, r: radius });
  return { tight, slack, torque };
}

/** Tension ratio from the slack side (when the actuating force sets P2): P1 = P2·e^{fφ}. */
export function bandTightFromSlack(slack: number, f: number, wrap: number): number {
  return slack * Math.exp(f * wrap);
}
