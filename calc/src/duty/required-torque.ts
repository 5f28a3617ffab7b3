import { compute, defineFormula, Derivation } from '../core/step.js';
import { REF } from '../core/references.js';
import { requireRange } from '../units/parse.js';
import type { Ratio, Torque } from '../units/quantities.js';

/** Which torque the required brake torque is a multiple of; printed on the sheet. */
export type ReferenceBasis = 'motor' | 'hoisting' | 'holding';

export const REFERENCE_BASIS_TEXT: Record<ReferenceBasis, string> = {
  motor: 'motor rated (full-load) torque',
  hoisting: 'rated-load hoisting torque at the brake (M_L/η)',
  holding: 'static holding torque while lowering (M_L·η)',
};

export const requiredTorqueFormula = defineFormula({
  id: 'required-torque',
  label: 'Required brake torque',
  symbol: 'M_req',
  expression: 'k * M_ref',
  symbols: {
    k: { text: 'k', dimension: 'dimensionless' },
    M_ref: { text: 'M_ref', dimension: 'torque' },
  },
  dimension: 'torque',
  reference: REF.requiredTorque,
});

/**
 * Required brake torque M_req = k·M_ref, with the reference torque chosen (motor rated torque,
 * rated-load hoisting torque or static holding torque) and the factor k from the criteria set
 * (e.g. 1.25 for one hoist holding brake, 29 CFR 1910.179(f)(2)).
 *
 * @param factor k (> 0); @param referenceTorque M_ref, N·m (> 0)
 * @example requiredBrakeTorque(ratio(1.25), torque(400)) // 500 N·m
 */
export function requiredBrakeTorque(
  factor: Ratio,
  referenceTorque: Torque,
  d?: Derivation,
  basis?: ReferenceBasis,
): Torque {
  requireRange(factor, 'factor', { min: 0, exclusiveMin: true });
  requireRange(referenceTorque, 'referenceTorque', { min: 0, exclusiveMin: true }, 'N·m');
  return compute(
    d,
    requiredTorqueFormula,
    { k: factor, M_ref: referenceTorque },
    basis ? { label: `Required brake torque (reference: ${REFERENCE_BASIS_TEXT[basis]})` } : {},
  );
}
