import { compute, defineFormula, Derivation, type StepOptions } from '../core/step.js';
import { REF } from '../core/references.js';
import { requireRange } from '../units/parse.js';
import { CalcInputError } from '../core/errors.js';
import type { Force, Length, Ratio, Torque } from '../units/quantities.js';

export const uniformWearRadiusFormula = defineFormula({
  id: 'effective-radius',
  label: 'Effective friction radius (uniform wear)',
  symbol: 'r_e',
  expression: '(r_o + r_i) / 2',
  symbols: {
    r_o: { text: 'r_o', dimension: 'length' },
    r_i: { text: 'r_i', dimension: 'length' },
  },
  dimension: 'length',
  reference: REF.caliper,
});

export const caliperTorqueFormula = defineFormula({
  id: 'torque-caliper',
  label: 'Brake torque of the caliper set',
  symbol: 'M_b',
  expression: 'mu * F_c * r_e * z_f * z_c',
  symbols: {
    mu: { text: 'μ', dimension: 'dimensionless' },
    F_c: { text: 'F_c', dimension: 'force' },
    r_e: { text: 'r_e', dimension: 'length' },
    z_f: { text: 'z_f', dimension: 'dimensionless' },
    z_c: { text: 'z_c', dimension: 'dimensionless' },
  },
  dimension: 'torque',
  reference: REF.caliper,
});

/**
 * Effective friction radius of a pad swept between r_i and r_o under uniform wear:
 * r_e = (r_o + r_i)/2. (Uniform pressure would give 2(r_o³ − r_i³)/(3(r_o² − r_i²)), larger.)
 * Source: Budynas & Nisbett, Shigley's MED 8th ed., §16-5.
 * @example uniformWearRadius(length(0.35), length(0.25)) // 0.30 m
 */
export function uniformWearRadius(outer: Length, inner: Length, d?: Derivation): Length {
  requireRange(inner, 'innerRadius', { min: 0, exclusiveMin: true }, 'm');
  if (!(outer > inner)) {
    throw new CalcInputError([
      { field: 'outerRadius', message: 'pad outer radius must exceed the inner radius' },
    ]);
  }
  return compute(d, uniformWearRadiusFormula, { r_o: outer, r_i: inner });
}

/** Uniform-pressure effective radius, for comparison: 2(r_o³ − r_i³)/(3(r_o² − r_i²)). */
export function uniformPressureRadius(outer: number, inner: number): number {
  return (2 * (outer ** 3 - inner ** 3)) / (3 * (outer ** 2 - inner ** 2));
}

/**
 * Torque of z_c calipers, each clamping with F_c on z_f friction faces at radius r_e:
 * M_b = μ·F_c·r_e·z_f·z_c.
 * @example caliperTorque(ratio(0.4), force(20_000), length(0.3), 2, 1) // 4800 N·m
 */
export function caliperTorque(
  mu: Ratio,
  clampForce: Force,
  effectiveRadius: Length,
  faces: number,
  calipers: number,
  d?: Derivation,
  options?: StepOptions,
): Torque {
  requireRange(mu, 'mu', { min: 0, max: 1, exclusiveMin: true });
  requireRange(clampForce, 'clampForce', { min: 0 }, 'N');
  requireRange(faces, 'faces', { min: 1 });
  requireRange(calipers, 'calipers', { min: 1 });
  return compute(
    d,
    caliperTorqueFormula,
    { mu, F_c: clampForce, r_e: effectiveRadius, z_f: faces, z_c: calipers },
    options,
  );
}
