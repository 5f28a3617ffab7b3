import { compute, defineFormula, Derivation } from '../core/step.js';
import { requireField } from '../core/errors.js';
import { limitCheck, type LimitCheck } from '../core/limit-check.js';
import { requireRange } from '../units/parse.js';
import type { Force, Ratio, Torque } from '../units/quantities.js';

const REF_SCALE =
  "brake torque proportional to μ·F_s (short shoe, pivoted symmetrical shoe and disc brake: Budynas & Nisbett, Shigley's MED 8th ed., §16-2, §16-4, §16-5)";

export const topOfRangeTorqueFormula = defineFormula({
  id: 'torque-max-adjustable',
  label: 'Brake torque at μ max with the spring at the top of its adjustable range',
  symbol: 'M_b,max,adj',
  expression: 'M_ref * (mu_max / mu_ref) * (F_max / F_ref)',
  symbols: {
    M_ref: { text: 'M_ref', dimension: 'torque' },
    mu_max: { text: 'μ_max', dimension: 'dimensionless' },
    mu_ref: { text: 'μ_ref', dimension: 'dimensionless' },
    F_max: { text: 'F_s,max', dimension: 'force' },
    F_ref: { text: 'F_s,ref', dimension: 'force' },
  },
  dimension: 'torque',
  reference: REF_SCALE,
});

export const trainBrakeTorqueFormula = defineFormula({
  id: 'drive-train-brake-torque',
  label: 'Brake torque the drive train can see (all brakes on it at μ max, top of range)',
  symbol: 'M_train',
  expression: 'n_b * M_adj',
  symbols: {
    n_b: { text: 'n_b', dimension: 'dimensionless' },
    M_adj: { text: 'M_b,max,adj', dimension: 'torque' },
  },
  dimension: 'torque',
  reference: 'sum of the brakes acting on the same drive train (statics)',
});

export interface DriveTrainOverloadInput {
  /**
   * Brake torque computed at a reference friction coefficient and spring force (for example the
   * sheet's torque at μ max with the set force). Use the higher of the long-shoe and short-shoe
   * models here: this check guards the drive train, so the larger torque is the conservative one.
   */
  torqueAtReference: Torque;
  /** Friction coefficient the reference torque was computed with (> 0). */
  muAtReference: Ratio;
  /** Spring force the reference torque was computed with, N (> 0). */
  springForceAtReference: Force;
  /** Highest friction coefficient of the lining band (≥ μ_ref is usual; > 0). */
  muMax: Ratio;
  /** Highest spring force the adjuster lets a fitter set, N (> 0). */
  springForceMax: Force;
  /** Brakes acting on the same drive train (1, or 2 for a two-brake hoist), integer ≥ 1. */
  brakesOnTrain: number;
  /** Torque rating of shaft, coupling and gearbox at the brake shaft, N·m (> 0). */
  driveTrainRating: Torque;
}

export interface DriveTrainOverloadResult {
  torqueTopOfRange: Torque;
  trainTorque: Torque;
  check: LimitCheck;
}

/**
 * Drive-train overload with the worst settings a fitter can reach: μ max and the spring at the
 * top of its adjustable range. For brakes whose torque is proportional to μ·F_s the torque there is
 * M = M_ref·(μ_max/μ_ref)·(F_s,max/F_s,ref); with n_b brakes on the same train M_train = n_b·M.
 * The check is M_train ≤ the drive-train rating (conservative: no credit for the motor-side
 * inertia, which takes part of the brake torque while decelerating).
 *
 * Validity: torque linear in μ and spring force (not self-energising long shoes, not band brakes).
 * Source: Shigley's MED 8th ed., §16-2/16-4/16-5 (torque ∝ μ·N); rating from equipment data.
 * @example driveTrainOverload({ torqueAtReference: torque(499.16), muAtReference: ratio(0.45),
 *   springForceAtReference: force(1100), muMax: ratio(0.45), springForceMax: force(1600),
 *   brakesOnTrain: 1, driveTrainRating: torque(1000) }).torqueTopOfRange // ≈ 726.1 N·m
 */
export function driveTrainOverload(
  input: DriveTrainOverloadInput,
  d?: Derivation,
): DriveTrainOverloadResult {
  requireRange(input.torqueAtReference, 'torqueAtReference', { min: 0 }, 'N·m');
  requireRange(input.muAtReference, 'muAtReference', { min: 0, exclusiveMin: true, max: 2 });
  requireRange(
    input.springForceAtReference,
    'springForceAtReference',
    { min: 0, exclusiveMin: true },
    'N',
  );
  requireRange(input.muMax, 'muMax', { min: 0, exclusiveMin: true, max: 2 });
  requireRange(input.springForceMax, 'springForceMax', { min: 0, exclusiveMin: true }, 'N');
  requireRange(input.brakesOnTrain, 'brakesOnTrain', { min: 1, max: 8 });
  requireField(Number.isInteger(input.brakesOnTrain), 'brakesOnTrain', 'must be a whole number');
  requireRange(input.driveTrainRating, 'driveTrainRating', { min: 0, exclusiveMin: true }, 'N·m');
  const torqueTopOfRange = compute(d, topOfRangeTorqueFormula, {
    M_ref: input.torqueAtReference,
    mu_max: input.muMax,
    mu_ref: input.muAtReference,
    F_max: input.springForceMax,
    F_ref: input.springForceAtReference,
  });
  const trainTorque = compute(d, trainBrakeTorqueFormula, {
    n_b: input.brakesOnTrain,
    M_adj: torqueTopOfRange,
  });
  const check = limitCheck({
    id: 'drive-train-overload',
    label:
      input.brakesOnTrain > 1
        ? `${input.brakesOnTrain === 2 ? 'Both brakes' : `All ${input.brakesOnTrain} brakes`} at μ max, spring at the top of its range ≤ drive-train rating`
        : 'Brake torque at μ max, spring at the top of its range ≤ drive-train rating',
    value: trainTorque,
    limit: input.driveTrainRating,
    dimension: 'torque',
    kind: 'max',
    source: 'equipment data (user input): drive-train torque rating at the brake shaft',
  });
  return { torqueTopOfRange, trainTorque, check };
}
