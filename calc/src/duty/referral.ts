import { compute, defineFormula, Derivation, type StepOptions } from '../core/step.js';
import { REF } from '../core/references.js';
import { requireRange } from '../units/parse.js';
import type { AngularSpeed, Inertia, Mass, Ratio, Speed, Torque } from '../units/quantities.js';

export const torqueDrivingFormula = defineFormula({
  id: 'torque-referred-driving',
  label: 'Torque at the brake shaft, drive powering the output',
  symbol: 'M_b',
  expression: 'M_out / (i * eta)',
  symbols: {
    M_out: { text: 'M_out', dimension: 'torque' },
    i: { text: 'i', dimension: 'dimensionless' },
    eta: { text: 'η', dimension: 'dimensionless' },
  },
  dimension: 'torque',
  reference: REF.referral,
});

export const torqueOverhaulingFormula = defineFormula({
  id: 'torque-referred-overhauling',
  label: 'Torque at the brake shaft, output driving back (overhauling)',
  symbol: 'M_b',
  expression: 'M_out * eta / i',
  symbols: {
    M_out: { text: 'M_out', dimension: 'torque' },
    i: { text: 'i', dimension: 'dimensionless' },
    eta: { text: 'η', dimension: 'dimensionless' },
  },
  dimension: 'torque',
  reference: REF.referral,
});

export const rotatingInertiaFormula = defineFormula({
  id: 'inertia-rotating-referred',
  label: 'Rotating inertia referred to the brake shaft',
  symbol: 'J_k,b',
  expression: 'J * (omega_k / omega_b)^2',
  symbols: {
    J: { text: 'J_k', dimension: 'inertia' },
    omega_k: { text: 'ω_k', dimension: 'angularSpeed' },
    omega_b: { text: 'ω_b', dimension: 'angularSpeed' },
  },
  dimension: 'inertia',
  reference: REF.referral,
});

export const linearInertiaFormula = defineFormula({
  id: 'inertia-linear-referred',
  label: 'Moving mass referred to the brake shaft',
  symbol: 'J_m,b',
  expression: 'm * (v / omega_b)^2',
  symbols: {
    m: { text: 'm', dimension: 'mass' },
    v: { text: 'v', dimension: 'speed' },
    omega_b: { text: 'ω_b', dimension: 'angularSpeed' },
  },
  dimension: 'inertia',
  reference: REF.referral,
});

/**
 * Output torque referred to the brake (input) shaft of a gear train with ratio i = ω_b/ω_out and
 * efficiency η. When the drive powers the output (hoisting) the shaft must supply M_out/(i·η);
 * when the output drives back (lowering, overhauling) the shaft holds M_out·η/i.
 *
 * @param outputTorque M_out, N·m (≥ 0); @param ratio i (> 0); @param efficiency η in (0, 1]
 * Source: power balance through the gear train (textbook identity).
 * @example referTorque(torque(10_000), ratio(40), ratio(0.9), 'driving') // ≈ 277.8 N·m
 */
export function referTorque(
  outputTorque: Torque,
  ratio: Ratio,
  efficiency: Ratio,
  flow: 'driving' | 'overhauling',
  d?: Derivation,
  options?: StepOptions,
): Torque {
  requireRange(outputTorque, 'outputTorque', { min: 0 }, 'N·m');
  requireRange(ratio, 'ratio', { min: 0, exclusiveMin: true });
  requireRange(efficiency, 'efficiency', { min: 0, max: 1, exclusiveMin: true });
  const f = flow === 'driving' ? torqueDrivingFormula : torqueOverhaulingFormula;
  return compute(d, f, { M_out: outputTorque, i: ratio, eta: efficiency }, options);
}

/**
 * Rotating inertia J_k at shaft speed ω_k referred to the brake shaft at ω_b: J·(ω_k/ω_b)²
 * (equal kinetic energy).
 * @example referRotatingInertia(inertia(100), angularSpeed(1), angularSpeed(40)) // 0.0625 kg·m²
 */
export function referRotatingInertia(
  J: Inertia,
  shaftSpeed: AngularSpeed,
  brakeSpeed: AngularSpeed,
  d?: Derivation,
  options?: StepOptions,
): Inertia {
  requireRange(J, 'inertia', { min: 0 }, 'kg·m²');
  requireRange(brakeSpeed, 'brakeSpeed', { min: 0, exclusiveMin: true }, 'rad/s');
  return compute(
    d,
    rotatingInertiaFormula,
    { J, omega_k: shaftSpeed, omega_b: brakeSpeed },
    options,
  );
}

/**
 * A mass moving at speed v referred to the brake shaft at ω_b: m·(v/ω_b)² (equal kinetic energy).
 * @example referLinearMass(mass(20_000), speed(0.2), angularSpeed(155)) // ≈ 0.0333 kg·m²
 */
export function referLinearMass(
  m: Mass,
  v: Speed,
  brakeSpeed: AngularSpeed,
  d?: Derivation,
  options?: StepOptions,
): Inertia {
  requireRange(m, 'mass', { min: 0 }, 'kg');
  requireRange(brakeSpeed, 'brakeSpeed', { min: 0, exclusiveMin: true }, 'rad/s');
  return compute(d, linearInertiaFormula, { m, v, omega_b: brakeSpeed }, options);
}
