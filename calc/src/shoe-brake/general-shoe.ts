import { requireRange } from '../units/parse.js';
import { CalcInputError } from '../core/errors.js';
import type { Derivation } from '../core/step.js';
import * as gf from './general-shoe-formulas.js';

/** Geometry of one shoe (Shigley's notation); angles in radians, lengths in m, pressures in Pa. */
export interface ShoeGeometry {
  /** Friction coefficient f. */
  f: number;
  /** Face width b. */
  b: number;
  /** Drum radius r. */
  r: number;
  /** Distance from drum centre to the shoe hinge pin, a. */
  a: number;
  /** Start and end of the lining, measured from the hinge pin line, θ1 < θ2 ≤ π. */
  theta1: number;
  theta2: number;
}

/** Moments about the hinge pin per unit maximum pressure p_a (N·m per Pa = m³). */
export interface ShoeMomentCoefficients {
  /** Angle of maximum pressure θ_a = min(θ2, 90°). */
  thetaA: number;
  /** M_f / p_a */
  mf: number;
  /** M_N / p_a */
  mn: number;
  /** T / p_a */
  torque: number;
}

/**
 * Shoe moments per unit maximum pressure for a long shoe with p = p_a·sin θ/sin θ_a:
 * M_f = (f·p_a·b·r/sin θ_a)·[r(cos θ1 − cos θ2) − (a/2)(sin²θ2 − sin²θ1)],
 * M_N = (p_a·b·r·a/sin θ_a)·[(θ2 − θ1)/2 − (sin 2θ2 − sin 2θ1)/4],
 * T = f·p_a·b·r²·(cos θ1 − cos θ2)/sin θ_a.
 *
 * Source: Budynas & Nisbett, Shigley's MED 8th ed., §16-2/16-3 (Eqs. 16-2, 16-3, 16-6).
 * @example shoeMomentCoefficients({ f: 0.28, b: 1.5, r: 6, a: 5, theta1: 0, theta2: 2.0944 }).mf
 *   // ≈ 17.96 (lbf·in per psi, Problem 16-1)
 */
export function shoeMomentCoefficients(g: ShoeGeometry): ShoeMomentCoefficients {
  requireRange(g.f, 'f', { min: 0, max: 1, exclusiveMin: true });
  requireRange(g.b, 'b', { min: 0, exclusiveMin: true });
  requireRange(g.r, 'r', { min: 0, exclusiveMin: true });
  requireRange(g.a, 'a', { min: 0, exclusiveMin: true });
  requireRange(g.theta1, 'theta1', { min: 0, max: Math.PI });
  requireRange(g.theta2, 'theta2', { min: 0, max: Math.PI, exclusiveMin: true });
  if (!(g.theta2 > g.theta1)) {
    throw new CalcInputError([{ field: 'theta2', message: 'θ2 must be greater than θ1' }]);
  }
  const thetaA = Math.min(g.theta2, Math.PI / 2);
  const sa = Math.sin(thetaA);
  const { f, b, r, a, theta1: t1, theta2: t2 } = g;
  const mf =
    ((f * b * r) / sa) *
    (r * (Math.cos(t1) - Math.cos(t2)) - (a / 2) * (Math.sin(t2) ** 2 - Math.sin(t1) ** 2));
  const mn = ((b * r * a) / sa) * ((t2 - t1) / 2 - (Math.sin(2 * t2) - Math.sin(2 * t1)) / 4);
  const torque = (f * b * r * r * (Math.cos(t1) - Math.cos(t2))) / sa;
  return { thetaA, mf, mn, torque };
}

export interface ShoeForceResult extends ShoeMomentCoefficients {
  /** Maximum pressure p_a, Pa. */
  maxPressure: number;
  /** Braking torque of this shoe, N·m. */
  shoeTorque: number;
  /** True when the friction moment helps the actuating force (self-energising shoe). */
  selfEnergising: boolean;
}

/**
 * Maximum pressure and torque of a shoe for an actuating force F at distance c from the hinge:
 * F = (M_N − M_f)/c for a self-energising shoe, (M_N + M_f)/c otherwise.
 * A self-energising shoe with M_f ≥ M_N self-locks: rejected as an input error.
 * With a Derivation, every step is recorded (formula, substitution, value, reference).
 *
 * Source: Budynas & Nisbett, Shigley's MED 8th ed., §16-2 (Eqs. 16-4, 16-5).
 */
export function shoeFromActuatingForce(
  g: ShoeGeometry,
  force: number,
  c: number,
  selfEnergising: boolean,
  d?: Derivation,
): ShoeForceResult {
  requireRange(force, 'force', { min: 0 });
  requireRange(c, 'c', { min: 0, exclusiveMin: true });
  const k = shoeMomentCoefficients(g);
  const denominator = selfEnergising ? k.mn - k.mf : k.mn + k.mf;
  if (!(denominator > 0)) {
    throw new CalcInputError([
      { field: 'f', message: 'the shoe self-locks (M_f ≥ M_N): reduce f or move the hinge' },
    ]);
  }
  if (d) return deriveFromActuatingForce(g, force, c, selfEnergising, d);
  const maxPressure = (force * c) / denominator;
  return { ...k, maxPressure, shoeTorque: k.torque * maxPressure, selfEnergising };
}

/**
 * The same solution recorded step by step (θ_a, p_a, M_f, M_N, T, and F back from the moments as
 * a closing check), so a checker can follow a published shoe problem line by line.
 */
function deriveFromActuatingForce(
  g: ShoeGeometry,
  force: number,
  c: number,
  selfEnergising: boolean,
  d: Derivation,
): ShoeForceResult {
  const { f, b, r, a, theta1, theta2 } = g;
  const theta_a = d.step(gf.maxPressureAngleFormula, { theta2 });
  const geometry = { f, b, r, a, theta1, theta2, theta_a };
  const maxPressure = d.step(
    selfEnergising ? gf.selfEnergisingPressureFormula : gf.opposingPressureFormula,
    { F: force, c, ...geometry },
  );
  const M_f = d.step(gf.frictionMomentFormula, { p_a: maxPressure, ...geometry });
  const M_N = d.step(gf.normalMomentFormula, {
    p_a: maxPressure,
    b,
    r,
    a,
    theta1,
    theta2,
    theta_a,
  });
  const shoeTorque = d.step(gf.shoeTorqueFormula, {
    p_a: maxPressure,
    f,
    b,
    r,
    theta1,
    theta2,
    theta_a,
  });
  d.step(selfEnergising ? gf.selfEnergisingForceFormula : gf.opposingForceFormula, {
    M_N,
    M_f,
    c,
  });
  return {
    thetaA: theta_a,
    mf: M_f / maxPressure,
    mn: M_N / maxPressure,
    torque: shoeTorque / maxPressure,
    maxPressure,
    shoeTorque,
    selfEnergising,
  };
}

/** Actuating force needed for a given maximum pressure (the forward form of the same equations). */
export function actuatingForce(
  g: ShoeGeometry,
  maxPressure: number,
  c: number,
  selfEnergising: boolean,
  d?: Derivation,
): number {
  requireRange(c, 'c', { min: 0, exclusiveMin: true });
  requireRange(maxPressure, 'maxPressure', { min: 0 });
  const k = shoeMomentCoefficients(g);
  if (!d) return (maxPressure * (selfEnergising ? k.mn - k.mf : k.mn + k.mf)) / c;
  const { f, b, r, a, theta1, theta2 } = g;
  const theta_a = d.step(gf.maxPressureAngleFormula, { theta2 });
  const p_a = maxPressure;
  const M_f = d.step(gf.frictionMomentFormula, { p_a, f, b, r, a, theta1, theta2, theta_a });
  const M_N = d.step(gf.normalMomentFormula, { p_a, b, r, a, theta1, theta2, theta_a });
  return d.step(selfEnergising ? gf.selfEnergisingForceFormula : gf.opposingForceFormula, {
    M_N,
    M_f,
    c,
  });
}
