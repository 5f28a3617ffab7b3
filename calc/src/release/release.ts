import { compute, defineFormula, Derivation } from '../core/step.js';
import { REF } from '../core/references.js';
import { requireRange } from '../units/parse.js';
import type { Force, Length, Ratio, Stiffness } from '../units/quantities.js';

export const releasedSpringForceFormula = defineFormula({
  id: 'released-spring-force',
  label: 'Spring force with the shoes lifted to the clearance',
  symbol: 'F_s,rel',
  expression: 'F_s + k * e * r_s',
  symbols: {
    F_s: { text: 'F_s', dimension: 'force' },
    k: { text: 'k_s', dimension: 'stiffness' },
    e: { text: 'ε', dimension: 'length' },
    r_s: { text: 'r_s', dimension: 'dimensionless' },
  },
  dimension: 'force',
  reference: REF.liftedSpring,
});

export const thrusterForceFormula = defineFormula({
  id: 'thruster-force-needed',
  label: 'Thruster force needed to hold the brake released',
  symbol: 'F_th,req',
  expression: 'F_rel * r_s / (r_t * eta)',
  symbols: {
    F_rel: { text: 'F_s,rel', dimension: 'force' },
    r_s: { text: 'r_s', dimension: 'dimensionless' },
    r_t: { text: 'r_t', dimension: 'dimensionless' },
    eta: { text: 'η_r', dimension: 'dimensionless' },
  },
  dimension: 'force',
  reference: REF.release,
});

export const forceMarginFormula = defineFormula({
  id: 'thruster-force-ratio',
  label: 'Thruster force ratio (rated ÷ needed)',
  symbol: 'n_th',
  expression: 'F_th / F_req',
  symbols: {
    F_th: { text: 'F_th', dimension: 'force' },
    F_req: { text: 'F_th,req', dimension: 'force' },
  },
  dimension: 'dimensionless',
  reference: REF.release,
});

export const workingStrokeFormula = defineFormula({
  id: 'working-stroke',
  label: 'Working (release) stroke of the thruster',
  symbol: 's_w',
  expression: 'e * r_t',
  symbols: {
    e: { text: 'ε', dimension: 'length' },
    r_t: { text: 'r_t', dimension: 'dimensionless' },
  },
  dimension: 'length',
  reference: REF.stroke,
});

export const headroomFormula = defineFormula({
  id: 'stroke-headroom',
  label: 'Stroke left above the released position',
  symbol: 's_top',
  expression: 's_n - s_r0 - s_w',
  symbols: {
    s_n: { text: 's_n', dimension: 'length' },
    s_r0: { text: 's_r,0', dimension: 'length' },
    s_w: { text: 's_w', dimension: 'length' },
  },
  dimension: 'length',
  reference: REF.stroke,
});

export const wornReserveFormula = defineFormula({
  id: 'reserve-stroke-worn',
  label: 'Reserve stroke left after the lining wear w',
  symbol: 's_r,w',
  expression: 's_r0 - w * r_t',
  symbols: {
    s_r0: { text: 's_r,0', dimension: 'length' },
    w: { text: 'w', dimension: 'length' },
    r_t: { text: 'r_t', dimension: 'dimensionless' },
  },
  dimension: 'length',
  reference: REF.stroke,
});

export const wearToReadjustFormula = defineFormula({
  id: 'wear-to-readjust',
  label: 'Lining wear per shoe until the minimum reserve stroke is reached',
  symbol: 'w_adj',
  expression: '(s_r0 - s_min) / r_t',
  symbols: {
    s_r0: { text: 's_r,0', dimension: 'length' },
    s_min: { text: 's_r,min', dimension: 'length' },
    r_t: { text: 'r_t', dimension: 'dimensionless' },
  },
  dimension: 'length',
  reference: REF.stroke,
});

export interface ReleaseInput {
  /** Spring force set (brake applied, new lining), N. */
  springForce: Force;
  springRate: Stiffness;
  /** Shoe clearance ε per shoe when released, m (> 0). */
  clearance: Length;
  /** Spring travel per unit shoe travel r_s (> 0). */
  springTravelRatio: Ratio;
  /** Thruster rod travel per unit shoe travel r_t (> 0). */
  thrusterTravelRatio: Ratio;
  /** Efficiency of the release linkage η_r in (0, 1]. */
  efficiency: Ratio;
  /** Rated thruster lift force, N (> 0). */
  thrusterForce: Force;
  /** Nominal thruster stroke, m (> 0). */
  nominalStroke: Length;
  /** Reserve stroke set with new lining (rod travel left before the piston bottoms), m (≥ 0). */
  reserveStroke: Length;
  /** Lining wear per shoe before re-adjustment, m (≥ 0). */
  wear: Length;
  /** Minimum reserve stroke before re-adjustment (maker's data), m (≥ 0). */
  minReserveStroke: Length;
}

export interface ReleaseResult {
  releasedSpringForce: Force;
  thrusterForceNeeded: Force;
  forceRatio: Ratio;
  workingStroke: Length;
  headroom: Length;
  wornReserveStroke: Length;
  wearToReadjust: Length;
  warnings: string[];
}

/**
 * Release of a spring-set thruster brake. The thruster compresses the spring further by ε·r_s
 * while lifting the shoes by the clearance ε: F_rel = F_s + k·ε·r_s. By virtual work through the
 * release linkage the rod must give F_th = F_rel·r_s/(r_t·η_r). Stroke budget: working stroke
 * s_w = ε·r_t; headroom s_n − s_r0 − s_w; wear w lowers the set position by w·r_t, leaving
 * s_r,w = s_r0 − w·r_t. At zero reserve the spring pushes on the thruster stop instead of the shoes
 * and the brake can lose all holding torque (warning).
 *
 * Source: statics (virtual work); stroke terms common practice — the thruster maker's data governs.
 */
export function releaseAndStroke(
  input: ReleaseInput,
  d?: Derivation,
  options?: { wearSteps?: boolean },
): ReleaseResult {
  requireRange(input.clearance, 'clearance', { min: 0, exclusiveMin: true }, 'm');
  requireRange(input.springTravelRatio, 'springTravelRatio', { min: 0, exclusiveMin: true });
  requireRange(input.thrusterTravelRatio, 'thrusterTravelRatio', { min: 0, exclusiveMin: true });
  requireRange(input.efficiency, 'releaseEfficiency', { min: 0, max: 1, exclusiveMin: true });
  requireRange(input.thrusterForce, 'thrusterForce', { min: 0, exclusiveMin: true }, 'N');
  requireRange(input.nominalStroke, 'nominalStroke', { min: 0, exclusiveMin: true }, 'm');
  requireRange(input.reserveStroke, 'reserveStroke', { min: 0 }, 'm');
  const releasedSpringForce = compute(d, releasedSpringForceFormula, {
    F_s: input.springForce,
    k: input.springRate,
    e: input.clearance,
    r_s: input.springTravelRatio,
  });
  const thrusterForceNeeded = compute(d, thrusterForceFormula, {
    F_rel: releasedSpringForce,
    r_s: input.springTravelRatio,
    r_t: input.thrusterTravelRatio,
    eta: input.efficiency,
  });
  const forceRatio = compute(d, forceMarginFormula, {
    F_th: input.thrusterForce,
    F_req: thrusterForceNeeded,
  });
  const workingStroke = compute(d, workingStrokeFormula, {
    e: input.clearance,
    r_t: input.thrusterTravelRatio,
  });
  const headroom = compute(d, headroomFormula, {
    s_n: input.nominalStroke,
    s_r0: input.reserveStroke,
    s_w: workingStroke,
  });
  // A sheet that prints the stroke–wear chain of its own records these two there: off here, they
  // are computed without steps instead of printing the same value twice.
  const dw = options?.wearSteps === false ? undefined : d;
  const wornReserveStroke = compute(dw, wornReserveFormula, {
    s_r0: input.reserveStroke,
    w: input.wear,
    r_t: input.thrusterTravelRatio,
  });
  const wearToReadjust = compute(dw, wearToReadjustFormula, {
    s_r0: input.reserveStroke,
    s_min: input.minReserveStroke,
    r_t: input.thrusterTravelRatio,
  });
  const warnings: string[] = [];
  if (wornReserveStroke <= 0) {
    warnings.push(
      "The reserve stroke reaches zero before the lining is fully worn: the spring then bears on the thruster's end stop, and with the reserve stroke used up the brake can lose all holding torque. Re-adjust earlier or set a larger reserve stroke.",
    );
  }
  if (headroom < 0) {
    warnings.push(
      'The thruster stroke does not cover the reserve stroke plus the working stroke: the shoes cannot lift to the set clearance.',
    );
  }
  return {
    releasedSpringForce,
    thrusterForceNeeded,
    forceRatio,
    workingStroke,
    headroom,
    wornReserveStroke,
    wearToReadjust,
    warnings,
  };
}
