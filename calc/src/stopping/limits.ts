import { compute, defineFormula, Derivation } from '../core/step.js';
import { REF } from '../core/references.js';
import { requireRange } from '../units/parse.js';
import type { Acceleration, Length, Mass, Ratio, Speed } from '../units/quantities.js';

export const tenPercentRuleFormula = defineFormula({
  id: 'ten-percent-distance',
  label: 'Allowed stopping distance (10 %-of-speed rule)',
  symbol: 's_max',
  expression: 'k * v * t_min',
  symbols: {
    k: { text: 'k_10', dimension: 'dimensionless' },
    v: { text: 'v', dimension: 'speed' },
    t_min: { text: '60 s/min', dimension: 'time' },
  },
  dimension: 'length',
  reference: REF.tenPercent,
});

export const adhesionNeededFormula = defineFormula({
  id: 'adhesion-needed',
  label: 'Wheel–rail adhesion needed by the stop',
  symbol: 'μ_req',
  expression: 'm * a / (m * g * n_b / n_w)',
  symbols: {
    m: { text: 'm', dimension: 'mass' },
    a: { text: 'a_L', dimension: 'acceleration' },
    g: { text: 'g', dimension: 'acceleration' },
    n_b: { text: 'n_braked', dimension: 'dimensionless' },
    n_w: { text: 'n_wheels', dimension: 'dimensionless' },
  },
  dimension: 'dimensionless',
  reference: REF.adhesion,
});

/**
 * Allowed stopping distance by the travel-brake rule "distance in ft = 10 % of full-load speed in
 * ft/min" (29 CFR 1910.179, bridge and trolley brakes). The same numbers hold in SI: metres =
 * 0.1 × speed in m/min, i.e. s_max = 6 s × v.
 * @example tenPercentStoppingDistance(speed(1)) // 6 m (1 m/s = 60 m/min)
 */
export function tenPercentStoppingDistance(v: Speed, d?: Derivation, fraction = 0.1): Length {
  requireRange(v, 'speed', { min: 0 }, 'm/s');
  requireRange(fraction, 'fraction', { min: 0, exclusiveMin: true });
  return compute(d, tenPercentRuleFormula, { k: fraction, v, t_min: 60 });
}

/**
 * Adhesion needed at the braked wheels to decelerate the travelling mass at a (equal wheel loads;
 * rolling resistance neglected, conservative): μ_req = m·a/(m·g·n_b/n_w).
 * @example adhesionNeeded(mass(50_000), acceleration(0.5), 2, 4) // ≈ 0.102
 */
export function adhesionNeeded(
  m: Mass,
  a: Acceleration,
  brakedWheels: number,
  wheels: number,
  d?: Derivation,
): Ratio {
  requireRange(m, 'travelMass', { min: 0, exclusiveMin: true }, 'kg');
  requireRange(wheels, 'wheels', { min: 1 });
  requireRange(brakedWheels, 'brakedWheels', { min: 1, max: wheels });
  return compute(d, adhesionNeededFormula, { m, a, g: 9.80665, n_b: brakedWheels, n_w: wheels });
}
