import { compute, defineFormula, Derivation, type StepOptions } from '../core/step.js';
import { REF } from '../core/references.js';
import { requireRange } from '../units/parse.js';
import type { Force, Ratio } from '../units/quantities.js';

export const shoeNormalForceFormula = defineFormula({
  id: 'shoe-normal-force',
  label: 'Normal force on each shoe',
  symbol: 'N',
  expression: 'F_s * i * eta',
  symbols: {
    F_s: { text: 'F_s', dimension: 'force' },
    i: { text: 'i', dimension: 'dimensionless' },
    eta: { text: 'η_L', dimension: 'dimensionless' },
  },
  dimension: 'force',
  reference: REF.shoeForce,
});

/**
 * Normal force on each shoe of a double-shoe brake from the main spring: N = F_s·i·η_L, with the
 * lever ratio i (shoe normal force per unit spring force, ideal linkage) and the linkage
 * efficiency η_L (pin friction).
 *
 * @param springForce F_s, N (≥ 0); @param leverRatio i (> 0); @param efficiency η_L in (0, 1]
 * @example shoeNormalForce(force(5000), ratio(2.5), ratio(0.95)) // 11 875 N
 */
export function shoeNormalForce(
  springForce: Force,
  leverRatio: Ratio,
  efficiency: Ratio,
  d?: Derivation,
  options?: StepOptions,
): Force {
  requireRange(springForce, 'springForce', { min: 0 }, 'N');
  requireRange(leverRatio, 'leverRatio', { min: 0, exclusiveMin: true });
  requireRange(efficiency, 'efficiency', { min: 0, max: 1, exclusiveMin: true });
  return compute(
    d,
    shoeNormalForceFormula,
    { F_s: springForce, i: leverRatio, eta: efficiency },
    options,
  );
}
