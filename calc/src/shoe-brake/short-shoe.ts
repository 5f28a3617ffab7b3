import { compute, defineFormula, Derivation, type StepOptions } from '../core/step.js';
import { REF } from '../core/references.js';
import { requireRange } from '../units/parse.js';
import type { Force, Length, Ratio, Torque } from '../units/quantities.js';

export const shortShoeTorqueFormula = defineFormula({
  id: 'torque-short-shoe',
  label: 'Brake torque, two short shoes',
  symbol: 'M_b',
  expression: '2 * mu * N * r',
  symbols: {
    mu: { text: 'μ', dimension: 'dimensionless' },
    N: { text: 'N', dimension: 'force' },
    r: { text: 'r', dimension: 'length' },
  },
  dimension: 'torque',
  reference: REF.shortShoe,
});

/**
 * Torque of a double-shoe brake by the short-shoe model (normal force concentrated at mid-shoe):
 * M_b = 2·μ·N·r = μ·N·D. Good for contact angles up to about 45°; above that use the pivoted
 * long-shoe model.
 *
 * @param mu friction coefficient μ (0 < μ ≤ 1); @param normalForce N per shoe, N (≥ 0)
 * @param radius drum radius r, m (> 0)
 * Source: Budynas & Nisbett, Shigley's MED 8th ed., §16-2.
 * @example shortShoeTorque(ratio(0.35), force(12_400), length(0.2)) // 1736 N·m
 */
export function shortShoeTorque(
  mu: Ratio,
  normalForce: Force,
  radius: Length,
  d?: Derivation,
  options?: StepOptions,
): Torque {
  requireRange(mu, 'mu', { min: 0, max: 1, exclusiveMin: true });
  requireRange(normalForce, 'normalForce', { min: 0 }, 'N');
  requireRange(radius, 'radius', { min: 0, exclusiveMin: true }, 'm');
  return compute(d, shortShoeTorqueFormula, { mu, N: normalForce, r: radius }, options);
}
