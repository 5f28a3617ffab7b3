import { compute, defineFormula, Derivation } from '../core/step.js';
import { REF } from '../core/references.js';
import { requireRange } from '../units/parse.js';
import type { Area, Force, Pressure } from '../units/quantities.js';

export const padPressureFormula = defineFormula({
  id: 'pad-pressure',
  label: 'Mean pad pressure',
  symbol: 'p_m',
  expression: 'F_c / A_pad',
  symbols: {
    F_c: { text: 'F_c', dimension: 'force' },
    A_pad: { text: 'A_pad', dimension: 'area' },
  },
  dimension: 'pressure',
  reference: REF.definition,
});

/**
 * Mean pressure on one pad: p = F_c/A_pad (each pad of a caliper carries the full clamp force).
 * @example padPressure(force(22_000), area(0.02)) // 1.1 MPa
 */
export function padPressure(clampForce: Force, padArea: Area, d?: Derivation): Pressure {
  requireRange(padArea, 'padArea', { min: 0, exclusiveMin: true }, 'm²');
  return compute(d, padPressureFormula, { F_c: clampForce, A_pad: padArea });
}
