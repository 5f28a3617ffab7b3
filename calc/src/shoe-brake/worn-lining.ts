import { compute, defineFormula, Derivation } from '../core/step.js';
import { REF } from '../core/references.js';
import { requireRange } from '../units/parse.js';
import { CalcInputError } from '../core/errors.js';
import type { Force, Length, Ratio, Stiffness } from '../units/quantities.js';

export const springExtensionFormula = defineFormula({
  id: 'wear-spring-extension',
  label: 'Spring extension caused by lining wear',
  symbol: 'ΔL_s',
  expression: 'w * r_s',
  symbols: {
    w: { text: 'w', dimension: 'length' },
    r_s: { text: 'r_s', dimension: 'dimensionless' },
  },
  dimension: 'length',
  reference: REF.wear,
});

export const relaxedSpringForceFormula = defineFormula({
  id: 'spring-force-relaxed',
  label: 'Spring force in service, after relaxation',
  symbol: 'F_s,r',
  expression: 'F_s * (1 - rho)',
  symbols: {
    F_s: { text: 'F_s', dimension: 'force' },
    rho: { text: 'ρ_s', dimension: 'dimensionless' },
  },
  dimension: 'force',
  reference: "spring maker's data (relaxation at the service temperature and stress)",
});

export const wornSpringForceFormula = defineFormula({
  id: 'worn-spring-force',
  label: 'Spring force after the wear w (before re-adjustment)',
  symbol: 'F_s,w',
  expression: 'F_s - k * dL',
  symbols: {
    F_s: { text: 'F_s', dimension: 'force' },
    k: { text: 'k_s', dimension: 'stiffness' },
    dL: { text: 'ΔL_s', dimension: 'length' },
  },
  dimension: 'force',
  reference: REF.wear,
});

/**
 * Spring force after the lining has worn by w on each shoe, before re-adjustment. The spring
 * extends by ΔL = w·r_s (r_s = spring travel per unit shoe travel; for an ideal symmetric
 * double-shoe linkage r_s = 2·i by virtual work) and loses k·ΔL: F_w = F_s − k·w·r_s.
 * Torque scales with F_w/F_s. A spring that would go slack is an input error (wear beyond what the
 * setting can follow). With a relaxation ρ_s the spring starts from F_s·(1 − ρ_s) in service.
 *
 * @param springForce F_s, N (> 0); @param rate k, N/m (≥ 0); @param wear w, m (≥ 0)
 * @param travelRatio r_s (> 0)
 * @example wornSpringForce(force(5000), stiffness(100_000), length(0.002), ratio(5)) // 4000 N
 */
export function wornSpringForce(
  springForce: Force,
  rate: Stiffness,
  wear: Length,
  travelRatio: Ratio,
  d?: Derivation,
  options?: {
    /** Where on the wear scale this is, for the printed steps: 'at the re-adjustment point', w_adj. */
    point?: { words: string; wearSymbol: string };
    /** Share of the set force lost to relaxation in service, ρ_s in [0, 1). */
    relaxation?: Ratio;
    /** What wears, for the printed steps: a shoe brake's lining (default) or a caliper's pads. */
    friction?: 'lining' | 'pad';
  },
): { extension: Length; force: Force } {
  const point = options?.point;
  requireRange(springForce, 'springForce', { min: 0, exclusiveMin: true }, 'N');
  requireRange(rate, 'springRate', { min: 0 }, 'N/m');
  requireRange(wear, 'wear', { min: 0 }, 'm');
  requireRange(travelRatio, 'travelRatio', { min: 0, exclusiveMin: true });
  const rho = options?.relaxation;
  if (rho !== undefined)
    requireRange(rho, 'springRelaxation', { min: 0, max: 1, exclusiveMax: true });
  const inService =
    rho === undefined
      ? springForce
      : compute(d, relaxedSpringForceFormula, { F_s: springForce, rho });
  const pads = options?.friction === 'pad';
  const extension = compute(
    d,
    springExtensionFormula,
    { w: wear, r_s: travelRatio },
    point
      ? {
          label: `Spring extension caused by ${pads ? 'pad' : 'lining'} wear, ${point.words}`,
          names: { w: point.wearSymbol },
        }
      : pads
        ? { label: 'Spring extension caused by pad wear' }
        : undefined,
  );
  const force = compute(
    d,
    wornSpringForceFormula,
    { F_s: inService, k: rate, dL: extension },
    point || rho !== undefined
      ? {
          ...(point ? { label: `Spring force ${point.words}` } : {}),
          ...(rho !== undefined ? { names: { F_s: 'F_s,r' } } : {}),
        }
      : undefined,
  );
  if (!(force > 0)) {
    throw new CalcInputError([
      {
        field: 'wear',
        message:
          'the spring goes slack before this wear: re-adjust earlier or reduce the wear allowance',
      },
    ]);
  }
  return { extension, force };
}

/** Torque at wear w as a fraction of the new-lining torque (for sweeps): (F_s − k·w·r_s)/F_s, ≥ 0. */
export function wornTorqueFraction(
  springForce: number,
  rate: number,
  wear: number,
  travelRatio: number,
): number {
  return Math.max(0, (springForce - rate * wear * travelRatio) / springForce);
}
