import { compute, defineFormula, Derivation } from '../core/step.js';
import { CalcInputError } from '../core/errors.js';
import { limitCheck, type LimitCheck } from '../core/limit-check.js';
import { requireRange } from '../units/parse.js';
import type { Force, Length, Ratio, Stiffness, Torque } from '../units/quantities.js';

const REF_CHAIN =
  "stroke chain of a thruster without lift stop: released, the rod runs to its end stop, so the working stroke is what the reserve leaves (s_n − s_r) and the clearance follows through the linkage (common practice; the thruster maker's data governs)";
const L = { dimension: 'length' } as const;
const R = { dimension: 'dimensionless' } as const;

export const clearanceFromStrokeFormula = defineFormula({
  id: 'clearance-from-stroke',
  label: 'Shoe clearance when released (rod at its end stop)',
  symbol: 'ε',
  expression: '(s_n - s_r) / r_t',
  symbols: { s_n: { text: 's_n', ...L }, s_r: { text: 's_r,0', ...L }, r_t: { text: 'r_t', ...R } },
  dimension: 'length',
  reference: REF_CHAIN,
});

export const wearReserveUsedFormula = defineFormula({
  id: 'wear-reserve-used',
  label: 'Lining wear per shoe at which the reserve stroke is used up (holding torque lost)',
  symbol: 'w_0',
  expression: 's_r / r_t',
  symbols: { s_r: { text: 's_r,0', ...L }, r_t: { text: 'r_t', ...R } },
  dimension: 'length',
  reference: REF_CHAIN,
});

export const readjustWearFormula = defineFormula({
  id: 'wear-readjust-point',
  label: 'Lining wear per shoe at the re-adjustment point (minimum reserve reached)',
  symbol: 'w_adj',
  expression: '(s_r - s_min) / r_t',
  symbols: {
    s_r: { text: 's_r,0', ...L },
    s_min: { text: 's_r,min', ...L },
    r_t: { text: 'r_t', ...R },
  },
  dimension: 'length',
  reference: REF_CHAIN,
});

export const torqueAtWearFormula = defineFormula({
  id: 'torque-at-readjust',
  label: 'Brake torque at the re-adjustment point',
  symbol: 'M_b,adj',
  expression: 'M_0 * (F_s * (1 - rho) - k * r_s * w) / F_s',
  symbols: {
    M_0: { text: 'M_b,0', dimension: 'torque' },
    F_s: { text: 'F_s', dimension: 'force' },
    rho: { text: 'ρ_s', ...R },
    k: { text: 'k_s', dimension: 'stiffness' },
    r_s: { text: 'r_s', ...R },
    w: { text: 'w_adj', ...L },
  },
  dimension: 'torque',
  reference:
    'spring extension from wear through the travel ratio: F = F_s·(1 − ρ_s) − k·r_s·w, ρ_s the relaxation in service; torque ∝ spring force (statics)',
});

export interface StrokeWearInput {
  /** Thruster nominal stroke s_n, m (> 0). */
  nominalStroke: Length;
  /** Reserve stroke set with new lining s_r,0 (rod travel left when applied), m (≥ 0, ≤ s_n). */
  reserveStroke: Length;
  /** Minimum reserve stroke (thruster maker's data) s_r,min, m (≥ 0). */
  minReserveStroke: Length;
  /** Thruster rod travel per unit shoe travel r_t (> 0). */
  thrusterTravelRatio: Ratio;
  /** Spring force as set (new lining) F_s, N (> 0). */
  springForce: Force;
  springRate: Stiffness;
  /** Spring travel per unit shoe travel r_s (> 0). */
  springTravelRatio: Ratio;
  /** Brake torque with new lining at the friction coefficient of interest (μ min for the check), N·m. */
  torqueNew: Torque;
  /** Share of the set force lost to spring relaxation in service, ρ_s in [0, 1) (default 0). */
  relaxation?: Ratio;
  /** Required torque, N·m (optional: adds the torque check at the re-adjustment point). */
  requiredTorque?: Torque;
}

export interface StrokeWearResult {
  clearance: Length;
  wearReserveUsed: Length;
  wearAtReadjust: Length;
  torqueAtReadjust: Torque;
  /** Torque against wear per shoe: falls with the spring, then to zero when the reserve is used up. */
  torqueAtWear(w: number): number;
  checks: LimitCheck[];
}

/**
 * One stroke–wear–setting chain for a spring-set brake released by a thruster without lift stop.
 * The fitter sets the reserve stroke; the rest follows: clearance ε = (s_n − s_r,0)/r_t (it grows
 * by w as the lining wears, since the released position stays at the end stop); the reserve falls
 * by w·r_t; re-adjust at w_adj = (s_r,0 − s_r,min)/r_t; at w_0 = s_r,0/r_t the reserve is used up,
 * the spring bears on the thruster's end stop and the holding torque falls to zero. Before that
 * M(w) = M_0·(F_s − k·r_s·w)/F_s.
 *
 * Checks: reserve as set ≥ minimum; torque at the re-adjustment point ≥ required (when given).
 * Source: common practice (stroke chain), statics (spring force); the maker's data governs.
 * @example strokeWearChain({ nominalStroke: length(0.05), reserveStroke: length(0.02),
 *   minReserveStroke: length(0.005), thrusterTravelRatio: ratio(25), ... }).clearance // 1.2 mm
 */
export function strokeWearChain(
  input: StrokeWearInput,
  d?: Derivation,
  options?: { torqueStep?: boolean },
): StrokeWearResult {
  const pos = { min: 0, exclusiveMin: true };
  requireRange(input.nominalStroke, 'nominalStroke', pos, 'm');
  requireRange(input.reserveStroke, 'reserveStroke', { min: 0, max: input.nominalStroke }, 'm');
  requireRange(input.minReserveStroke, 'minReserveStroke', { min: 0 }, 'm');
  requireRange(input.thrusterTravelRatio, 'thrusterTravelRatio', pos);
  requireRange(input.springForce, 'springForce', pos, 'N');
  requireRange(input.springRate, 'springRate', { min: 0 }, 'N/m');
  requireRange(input.springTravelRatio, 'springTravelRatio', pos);
  requireRange(input.torqueNew, 'torqueNew', { min: 0 }, 'N·m');
  if (input.requiredTorque !== undefined)
    requireRange(input.requiredTorque, 'requiredTorque', { min: 0 }, 'N·m');
  const r_t = input.thrusterTravelRatio;
  const clearance = compute(d, clearanceFromStrokeFormula, {
    s_n: input.nominalStroke,
    s_r: input.reserveStroke,
    r_t,
  });
  const wearReserveUsed = compute(d, wearReserveUsedFormula, { s_r: input.reserveStroke, r_t });
  const wearAtReadjust = compute(d, readjustWearFormula, {
    s_r: input.reserveStroke,
    s_min: input.minReserveStroke,
    r_t,
  });
  const kr = input.springRate * input.springTravelRatio;
  const rho = input.relaxation ?? 0;
  if (input.relaxation !== undefined)
    requireRange(input.relaxation, 'springRelaxation', { min: 0, max: 1, exclusiveMax: true });
  // The spring's force in service, after relaxation: where every worn case starts from.
  const inService = input.springForce * (1 - rho);
  if (!(inService - kr * Math.max(0, wearAtReadjust) > 0)) {
    throw new CalcInputError([
      { field: 'springForce', message: 'the spring goes slack before the re-adjustment point' },
    ]);
  }
  // A sheet that derives the worn torque step by step (worn spring force, normal force, torque)
  // computes this value without a step rather than print the same torque twice.
  const torqueAtReadjust = compute(
    options?.torqueStep === false ? undefined : d,
    torqueAtWearFormula,
    {
      M_0: input.torqueNew,
      F_s: input.springForce,
      rho,
      k: input.springRate,
      r_s: input.springTravelRatio,
      w: Math.max(0, wearAtReadjust),
    },
  );
  const torqueAtWear = (w: number): number => {
    if (!(w < wearReserveUsed)) return 0;
    const F = inService - kr * Math.max(0, w);
    return F > 0 ? (input.torqueNew * F) / input.springForce : 0;
  };
  const checks: LimitCheck[] = [
    limitCheck({
      id: 'reserve-stroke-set',
      label: 'Reserve stroke as set ≥ minimum reserve stroke',
      value: input.reserveStroke,
      limit: input.minReserveStroke,
      dimension: 'length',
      kind: 'min',
      source: "equipment data (user input): thruster maker's minimum reserve stroke",
    }),
  ];
  if (input.requiredTorque !== undefined) {
    checks.push(
      limitCheck({
        id: 'torque-at-readjust',
        label: 'Brake torque at the re-adjustment point ≥ required',
        value: torqueAtReadjust,
        limit: input.requiredTorque,
        dimension: 'torque',
        kind: 'min',
        source: 'required torque of the sheet (criteria set)',
      }),
    );
  }
  return { clearance, wearReserveUsed, wearAtReadjust, torqueAtReadjust, torqueAtWear, checks };
}

/**
 * Points of the torque-against-wear chart up to `maxWear`, with the drop to zero drawn as a
 * vertical step at w_0 (two points at the same wear) so the chart cannot smooth it away.
 */
export function torqueWearPoints(
  chain: Pick<StrokeWearResult, 'torqueAtWear' | 'wearReserveUsed'>,
  maxWear: number,
  steps = 20,
): { x: number; y: number }[] {
  requireRange(maxWear, 'maxWear', { min: 0, exclusiveMin: true }, 'm');
  const pts: { x: number; y: number }[] = [];
  const w0 = chain.wearReserveUsed;
  for (let k = 0; k <= steps; k++) {
    const w = (maxWear * k) / steps;
    if (w0 > 0 && pts.length && pts[pts.length - 1]!.x < w0 && w >= w0) {
      const before = chain.torqueAtWear(w0 * (1 - 1e-12));
      pts.push({ x: w0, y: before }, { x: w0, y: 0 });
      if (w === w0) continue;
    }
    pts.push({ x: w, y: chain.torqueAtWear(w) });
  }
  return pts;
}
