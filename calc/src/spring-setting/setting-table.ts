import { compute, defineFormula, Derivation } from '../core/step.js';
import { REF } from '../core/references.js';
import { requireRange } from '../units/parse.js';
import { CalcInputError } from '../core/errors.js';
import type { Force, Length, Stiffness } from '../units/quantities.js';

export const springLengthFormula = defineFormula({
  id: 'spring-length',
  label: 'Set (installed) length of the main spring',
  symbol: 'L_set',
  expression: 'L_0 - F_s / k',
  symbols: {
    L_0: { text: 'L_0', dimension: 'length' },
    F_s: { text: 'F_s', dimension: 'force' },
    k: { text: 'k_s', dimension: 'stiffness' },
  },
  dimension: 'length',
  reference: REF.springSetting,
});

/**
 * Installed length of a linear spring for force F: L = L0 − F/k. Throws a field error when F
 * would compress the spring below zero length (a sign of wrong inputs).
 * @example springLength(length(0.3), force(10_000), stiffness(100_000)) // 0.2 m
 */
export function springLength(
  freeLength: Length,
  force: Force,
  rate: Stiffness,
  d?: Derivation,
): Length {
  requireRange(freeLength, 'springFreeLength', { min: 0, exclusiveMin: true }, 'm');
  requireRange(rate, 'springRate', { min: 0, exclusiveMin: true }, 'N/m');
  const L = compute(d, springLengthFormula, { L_0: freeLength, F_s: force, k: rate });
  if (!(L > 0))
    throw new CalcInputError([
      {
        field: 'springForce',
        message: 'the spring force exceeds what the spring can give (length ≤ 0)',
      },
    ]);
  return L;
}

export interface SettingRow extends Record<string, number> {
  springForce: number;
  springLength: number;
  torqueNominal: number;
  torqueMin: number;
}

/**
 * Spring setting table for the field team: spring force and length against brake torque in equal
 * steps across the adjustable spring-force range [F_min, F_max]. Torque is linear in spring force
 * (torque per newton at nominal and minimum friction given).
 */
export function settingTable(
  minForce: number,
  maxForce: number,
  freeLength: number,
  rate: number,
  torquePerNewtonNominal: number,
  torquePerNewtonMin: number,
  rows = 11,
): SettingRow[] {
  requireRange(minForce, 'springForceMin', { min: 0 }, 'N');
  if (!(maxForce > minForce))
    throw new CalcInputError([
      { field: 'springForceMax', message: 'must exceed the minimum spring force' },
    ]);
  const n = Math.max(2, Math.floor(rows));
  const out: SettingRow[] = [];
  for (let k = 0; k < n; k++) {
    const F = minForce + ((maxForce - minForce) * k) / (n - 1);
    out.push({
      springForce: F,
      springLength: freeLength - F / rate,
      torqueNominal: F * torquePerNewtonNominal,
      torqueMin: F * torquePerNewtonMin,
    });
  }
  return out;
}
