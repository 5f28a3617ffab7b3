import { compute, defineFormula, Derivation, type StepOptions } from '../core/step.js';
import { REF } from '../core/references.js';
import { requireRange } from '../units/parse.js';
import type { Angle, Force, Length, Pressure, Ratio, Torque } from '../units/quantities.js';

export const pivotDistanceFormula = defineFormula({
  id: 'pivot-distance',
  label: 'Pivot distance of a symmetrical pivoted shoe (friction moment zero)',
  symbol: 'a',
  expression: '4 * r * sin(theta2) / (2 * theta2 + sin(2 * theta2))',
  symbols: {
    r: { text: 'r', dimension: 'length' },
    theta2: { text: 'θ₂', dimension: 'angle' },
  },
  dimension: 'length',
  reference: REF.pivotedShoe,
});

export const pivotedNormalForceFormula = defineFormula({
  id: 'pivoted-normal-force',
  label: 'Normal resultant of a pivoted shoe',
  symbol: 'N',
  expression: 'p_a * b * r * (2 * theta2 + sin(2 * theta2)) / 2',
  symbols: {
    p_a: { text: 'p_a', dimension: 'pressure' },
    b: { text: 'b', dimension: 'length' },
    r: { text: 'r', dimension: 'length' },
    theta2: { text: 'θ₂', dimension: 'angle' },
  },
  dimension: 'force',
  reference: REF.pivotedShoe,
});

export const pivotedPeakPressureFormula = defineFormula({
  id: 'peak-pressure',
  label: 'Peak lining pressure (p = p_a·cos θ)',
  symbol: 'p_a',
  expression: '2 * N / (b * r * (2 * theta2 + sin(2 * theta2)))',
  symbols: {
    N: { text: 'N', dimension: 'force' },
    b: { text: 'b', dimension: 'length' },
    r: { text: 'r', dimension: 'length' },
    theta2: { text: 'θ₂', dimension: 'angle' },
  },
  dimension: 'pressure',
  reference: REF.pivotedShoe,
});

export const pivotedTorqueFormula = defineFormula({
  id: 'torque-pivoted-shoe',
  label: 'Brake torque, two pivoted long shoes',
  symbol: 'M_b',
  expression: 'n * a * mu * N',
  symbols: {
    n: { text: 'n_sh', dimension: 'dimensionless' },
    a: { text: 'a', dimension: 'length' },
    mu: { text: 'μ', dimension: 'dimensionless' },
    N: { text: 'N', dimension: 'force' },
  },
  dimension: 'torque',
  reference: REF.pivotedShoe,
});

function checkGeometry(radius: number, halfAngle: number): void {
  requireRange(radius, 'radius', { min: 0, exclusiveMin: true }, 'm');
  // The cos θ pressure law and a > r need a half-angle below 90°.
  requireRange(
    halfAngle,
    'halfAngle',
    { min: 0, max: Math.PI / 2, exclusiveMin: true, exclusiveMax: true },
    'rad',
  );
}

/**
 * Pivot distance of a symmetrical pivoted shoe that makes the friction moment about the pivot
 * zero: a = 4r·sin θ₂/(2θ₂ + sin 2θ₂); θ₂ is the half contact angle.
 *
 * Source: Budynas & Nisbett, Shigley's MED 8th ed., §16-4 (Problem 16-8: θ₂ = 60° gives a = 1.170·r).
 * @param radius r, m (> 0); @param halfAngle θ₂, rad in (0, π/2)
 * @example pivotDistance(length(0.25), degrees(60)) // ≈ 0.29253 m
 */
export function pivotDistance(
  radius: Length,
  halfAngle: Angle,
  d?: Derivation,
  options?: StepOptions,
): Length {
  checkGeometry(radius, halfAngle);
  return compute(d, pivotDistanceFormula, { r: radius, theta2: halfAngle }, options);
}

/**
 * Normal resultant of a pivoted shoe for a peak pressure: N = p_a·b·r·(2θ₂ + sin 2θ₂)/2.
 * @example pivotedNormalForce(pressure(0.5e6), length(0.1), length(0.25), degrees(60)) // ≈ 18 502.6 N
 */
export function pivotedNormalForce(
  peak: Pressure,
  width: Length,
  radius: Length,
  halfAngle: Angle,
  d?: Derivation,
): Force {
  checkGeometry(radius, halfAngle);
  requireRange(width, 'width', { min: 0, exclusiveMin: true }, 'm');
  requireRange(peak, 'peakPressure', { min: 0 }, 'Pa');
  return compute(d, pivotedNormalForceFormula, {
    p_a: peak,
    b: width,
    r: radius,
    theta2: halfAngle,
  });
}

/** Peak pressure of a pivoted shoe for a normal resultant N (inverse of pivotedNormalForce). */
export function pivotedPeakPressure(
  normalForce: Force,
  width: Length,
  radius: Length,
  halfAngle: Angle,
  d?: Derivation,
  options?: StepOptions,
): Pressure {
  checkGeometry(radius, halfAngle);
  requireRange(width, 'width', { min: 0, exclusiveMin: true }, 'm');
  requireRange(normalForce, 'normalForce', { min: 0 }, 'N');
  return compute(
    d,
    pivotedPeakPressureFormula,
    { N: normalForce, b: width, r: radius, theta2: halfAngle },
    options,
  );
}

/**
 * Torque of `shoes` pivoted symmetrical shoes: M_b = n·a·μ·N (T = a·f·N per shoe).
 * @example pivotedShoeTorque(ratio(0.35), force(18_502.6), length(0.29253), 1) // ≈ 1894.4 N·m
 */
export function pivotedShoeTorque(
  mu: Ratio,
  normalForce: Force,
  pivot: Length,
  shoes = 2,
  d?: Derivation,
  options?: StepOptions,
): Torque {
  requireRange(mu, 'mu', { min: 0, max: 1, exclusiveMin: true });
  requireRange(normalForce, 'normalForce', { min: 0 }, 'N');
  return compute(d, pivotedTorqueFormula, { n: shoes, a: pivot, mu, N: normalForce }, options);
}
