import { compute, defineFormula, Derivation } from '../core/step.js';
import { requireField } from '../core/errors.js';
import { limitCheck, type LimitCheck } from '../core/limit-check.js';
import { requireRange } from '../units/parse.js';
import type { Ratio } from '../units/quantities.js';

const REF_VW =
  'principle of virtual work for an ideal (frictionless) linkage: F_s·δs = Σ N·δx, so δs/δx = n_shoes·N/F_s = n_shoes·i (statics)';

export const geometricSpringTravelRatioFormula = defineFormula({
  id: 'spring-travel-ratio-geometry',
  label: 'Spring travel per unit shoe travel from the lever ratio',
  symbol: 'r_s,geo',
  expression: 'n * i',
  symbols: {
    n: { text: 'n_shoes', dimension: 'dimensionless' },
    i: { text: 'i', dimension: 'dimensionless' },
  },
  dimension: 'dimensionless',
  reference: REF_VW,
});

export const ratioDeviationFormula = defineFormula({
  id: 'spring-travel-ratio-deviation',
  label: 'Entered spring travel ratio ÷ linkage value − 1',
  symbol: 'Δ_rs',
  expression: 'r / r_geo - 1',
  symbols: {
    r: { text: 'r_s', dimension: 'dimensionless' },
    r_geo: { text: 'r_s,geo', dimension: 'dimensionless' },
  },
  dimension: 'dimensionless',
  reference: 'definition',
});

export const geometricThrusterTravelRatioFormula = defineFormula({
  id: 'thruster-travel-ratio-geometry',
  label: 'Thruster rod travel per unit shoe travel from the linkage',
  symbol: 'r_t,geo',
  expression: 'r_geo * k_ts',
  symbols: {
    r_geo: { text: 'r_s,geo', dimension: 'dimensionless' },
    k_ts: { text: 'k_ts', dimension: 'dimensionless' },
  },
  dimension: 'dimensionless',
  reference:
    'kinematics of the release lever: rod travel = spring travel × (thruster arm ÷ spring arm) (statics)',
});

export interface TravelRatioInput {
  /** Ideal lever ratio i = shoe normal force ÷ spring force (efficiency not included), > 0. */
  leverRatio: Ratio;
  /** Shoes moved by the one spring (2 for a double-shoe brake), integer ≥ 1. */
  shoes: number;
  /** Spring travel per unit shoe travel as entered on the sheet, > 0. */
  springTravelRatio: Ratio;
  /** Thruster rod travel per unit shoe travel as entered, with its lever geometry (optional). */
  thruster?: {
    travelRatio: Ratio;
    /** Rod travel ÷ spring travel at the release lever (arm ratio), > 0. */
    rodPerSpringTravel: Ratio;
  };
  /** Allowed relative deviation (default 0.03 = 3 %, common practice for measured lever arms). */
  tolerance?: Ratio;
}

export interface TravelRatioResult {
  geometricRatio: Ratio;
  deviation: Ratio;
  thrusterGeometricRatio?: Ratio;
  thrusterDeviation?: Ratio;
  checks: LimitCheck[];
}

/**
 * The spring travel ratio r_s (how far the main spring extends per unit of shoe travel — it sets
 * the force lost to lining wear) must follow the same linkage as the lever ratio i. For an ideal
 * linkage virtual work gives r_s = n_shoes·i exactly; a value entered separately is checked
 * against it: |r_s/(n·i) − 1| ≤ tolerance. Optionally the thruster travel ratio is checked the
 * same way against r_s,geo·(rod travel ÷ spring travel).
 *
 * Validity: symmetric linkage, equal shoe travel, small motions (ratios constant over the stroke).
 * Source: principle of virtual work (statics); tolerance common practice.
 * @example travelRatioCheck({ leverRatio: ratio(2.5), shoes: 2, springTravelRatio: ratio(5) })
 *   .checks[0].pass // true (5 = 2 × 2.5)
 */
export function travelRatioCheck(input: TravelRatioInput, d?: Derivation): TravelRatioResult {
  requireRange(input.leverRatio, 'leverRatio', { min: 0, exclusiveMin: true });
  requireRange(input.shoes, 'shoes', { min: 1, max: 8 });
  requireField(Number.isInteger(input.shoes), 'shoes', 'must be a whole number');
  requireRange(input.springTravelRatio, 'springTravelRatio', { min: 0, exclusiveMin: true });
  if (input.thruster) {
    requireRange(input.thruster.travelRatio, 'thrusterTravelRatio', { min: 0, exclusiveMin: true });
    requireRange(input.thruster.rodPerSpringTravel, 'rodPerSpringTravel', {
      min: 0,
      exclusiveMin: true,
    });
  }
  const tol = input.tolerance ?? 0.03;
  requireRange(tol, 'tolerance', { min: 0, max: 0.5 });
  const geometricRatio = compute(d, geometricSpringTravelRatioFormula, {
    n: input.shoes,
    i: input.leverRatio,
  });
  const deviation = compute(d, ratioDeviationFormula, {
    r: input.springTravelRatio,
    r_geo: geometricRatio,
  });
  const source = `${REF_VW}; tolerance ${(tol * 100).toFixed(1)} % (common practice)`;
  const checks: LimitCheck[] = [
    limitCheck({
      id: 'spring-travel-ratio-geometry',
      label: 'Spring travel ratio agrees with the lever ratio (|deviation| ≤ tolerance)',
      value: Math.abs(deviation),
      limit: tol,
      dimension: 'dimensionless',
      kind: 'max',
      source,
    }),
  ];
  let thrusterGeometricRatio: Ratio | undefined;
  let thrusterDeviation: Ratio | undefined;
  if (input.thruster) {
    thrusterGeometricRatio = compute(d, geometricThrusterTravelRatioFormula, {
      r_geo: geometricRatio,
      k_ts: input.thruster.rodPerSpringTravel,
    });
    thrusterDeviation = compute(
      d,
      ratioDeviationFormula,
      { r: input.thruster.travelRatio, r_geo: thrusterGeometricRatio },
      {
        id: 'thruster-travel-ratio-deviation',
        label: 'Entered thruster travel ratio ÷ linkage value − 1',
        symbol: 'Δ_rt',
      },
    );
    checks.push(
      limitCheck({
        id: 'thruster-travel-ratio-geometry',
        label: 'Thruster travel ratio agrees with the linkage (|deviation| ≤ tolerance)',
        value: Math.abs(thrusterDeviation),
        limit: tol,
        dimension: 'dimensionless',
        kind: 'max',
        source,
      }),
    );
  }
  return { geometricRatio, deviation, thrusterGeometricRatio, thrusterDeviation, checks };
}
