import { defineFormula } from '../core/step.js';

/**
 * Wear limits of a drum brake: the lining wear from new to its minimum thickness, and the torque
 * on a drum worn or re-machined to its smallest diameter (same shoe force, smaller radius).
 */
export const REF_DRUM =
  'torque ∝ friction radius at equal shoe force (statics; Budynas & Nisbett, Shigley’s MED 8th ed., §16-2); the lining’s arc change with thickness is neglected';

export const liningWearAllowanceFormula = defineFormula({
  id: 'lining-wear-allowance',
  label: 'Lining wear per shoe from new to minimum thickness',
  symbol: 'w_L',
  expression: 't - t_min',
  symbols: {
    t: { text: 't_L', dimension: 'length' },
    t_min: { text: 't_L,min', dimension: 'length' },
  },
  dimension: 'length',
  reference: "lining maker's minimum thickness (equipment data)",
});

export const torqueDrumLimitFormula = defineFormula({
  id: 'torque-drum-limit',
  label: 'Brake torque at μ min, re-adjustment point, drum at its wear limit',
  symbol: 'M_b,D,min',
  expression: 'M_w * (D - dD) / D',
  symbols: {
    M_w: { text: 'M_b,w,min', dimension: 'torque' },
    D: { text: 'D', dimension: 'length' },
    dD: { text: 'ΔD', dimension: 'length' },
  },
  dimension: 'torque',
  reference: REF_DRUM,
});
