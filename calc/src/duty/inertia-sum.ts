import { compute, defineFormula, Derivation, type StepOptions } from '../core/step.js';
import { REF } from '../core/references.js';
import type { Inertia } from '../units/quantities.js';

export const inertiaSumFormula = defineFormula({
  id: 'inertia-total',
  label: 'Total inertia referred to the brake shaft',
  symbol: 'J_eq',
  expression: 'J_m + J_bd + J_g + J_o + J_L',
  symbols: {
    J_m: { text: 'J_mot', dimension: 'inertia' },
    J_bd: { text: 'J_drum', dimension: 'inertia' },
    J_g: { text: 'J_gear', dimension: 'inertia' },
    J_o: { text: 'J_out,b', dimension: 'inertia' },
    J_L: { text: 'J_load,b', dimension: 'inertia' },
  },
  dimension: 'inertia',
  reference: REF.referral,
});

/**
 * J_eq = J_mot + J_drum + J_gear + J_out,b + J_load,b: motor rotor, brake drum/disc and coupling,
 * gearbox (already at the brake shaft), output parts referred by (ω_k/ω_b)², moving masses by (v/ω_b)².
 */
export function inertiaTotal(
  parts: { motor: Inertia; brakeDrum: Inertia; gear: Inertia; output: Inertia; load: Inertia },
  d?: Derivation,
  options?: StepOptions,
): Inertia {
  return compute(
    d,
    inertiaSumFormula,
    {
      J_m: parts.motor,
      J_bd: parts.brakeDrum,
      J_g: parts.gear,
      J_o: parts.output,
      J_L: parts.load,
    },
    options,
  );
}
