import { Derivation } from '../core/step.js';
import { CalcInputError } from '../core/errors.js';
import { limitCheck, type LimitCheck } from '../core/limit-check.js';
import { requireRange } from '../units/parse.js';
import { stopping, type StoppingResult } from '../stopping/stopping.js';
import type {
  AngularSpeed,
  Inertia,
  Length,
  Ratio,
  Speed,
  Time,
  Torque,
} from '../units/quantities.js';

/**
 * The rule text this check applies. California Title 8 §4898 read from the published text;
 * the 29 CFR paragraph numbers are those the federal text uses for the same words (recalled,
 * and matching the criteria set's citation).
 */
export const HOT_METAL_RULE =
  'Each independent hoisting unit of a crane handling hot metal and having power control braking means shall be equipped with at least two holding brakes: 29 CFR 1910.179(f)(2)(vi); California Title 8 §4898(h)';
export const EACH_OF_TWO_RULE =
  'Holding brakes: not less than 100 % of the full-load hoisting torque at the point where the brake is applied, each, if two holding brakes are provided: 29 CFR 1910.179(f)(2)(i)(c); California Title 8 §4898(c)(3)';

export interface RedundancyBrake {
  /** Torque of this brake alone at μ min and at the re-adjustment point (worn), N·m (≥ 0). */
  torqueMinWorn: Torque;
  /** Torque of this brake at μ max with its spring at the top of its range, N·m (≥ 0). */
  torqueMaxTopOfRange: Torque;
}

export interface RedundancyInput {
  /** The hoist handles hot metal (molten material). */
  hotMetal: boolean;
  /** Lowering speed is controlled by power control braking (regenerative, dynamic, eddy current…). */
  powerControlBraking: boolean;
  /** The holding brakes installed on this hoisting unit (1 or more). */
  brakes: RedundancyBrake[];
  /** Full-load hoisting torque at the point where the brakes are applied, N·m (> 0). */
  hoistingTorque: Torque;
  /** Static load torque at the brake shaft (no efficiency), N·m (> 0). */
  loadTorque: Torque;
  /** Efficiency of the train driven backwards by the load (1 = no credit), in (0, 1]. */
  backDrivingEfficiency: Ratio;
  /** Inertia referred to the brake shaft, kg·m² (> 0). */
  inertia: Inertia;
  /** Highest lowering speed at the brake shaft, rad/s (> 0). */
  lowerSpeed: AngularSpeed;
  /** Hook speed at that shaft speed, m/s (> 0). */
  loadSpeed: Speed;
  /** Set delay of each brake, s (≥ 0). */
  setDelay: Time;
  /** Allowed stopping distance when one brake stops the load alone (optional), m (> 0). */
  stoppingDistanceLimit?: Length;
  /** Drive-train torque rating at the brake shaft, N·m (> 0). */
  driveTrainRating: Torque;
}

export interface RedundancyResult {
  /** Holding brakes the rule asks for (2 for hot metal with power control braking, else 1). */
  requiredBrakes: number;
  /** The rule set that applies, to print beside the checks. */
  rules: string[];
  /** Stop of the load by each brake alone, in input order. */
  stops: StoppingResult[];
  checks: LimitCheck[];
}

/**
 * Redundancy of the holding brakes of a hoisting unit. For hot metal with power control braking
 * the rule asks for at least two holding brakes; with two, each must hold 100 % of the full-load
 * hoisting torque. Checked here: the number installed; each brake alone (its lowest torque in service) holds 100 %
 * of the hoisting torque; each brake alone stops the load from the highest lowering speed after
 * its set delay (torque above the back-driving torque, and within the allowed distance when
 * given); all brakes together at μ max with springs at the top of their range stay within the
 * drive-train rating (they can all act at once).
 *
 * Source: 29 CFR 1910.179(f)(2); California Title 8 §4898 (text above); stopping by rigid-body
 * dynamics (stopping()). Defer to the governing standard and local code.
 */
export function holdingBrakeRedundancy(input: RedundancyInput, d?: Derivation): RedundancyResult {
  const pos = { min: 0, exclusiveMin: true };
  if (!Array.isArray(input.brakes) || input.brakes.length < 1 || input.brakes.length > 4)
    throw new CalcInputError([{ field: 'brakes', message: 'give one to four holding brakes' }]);
  input.brakes.forEach((b, i) => {
    requireRange(b.torqueMinWorn, `brakes[${i}].torqueMinWorn`, { min: 0 }, 'N·m');
    requireRange(b.torqueMaxTopOfRange, `brakes[${i}].torqueMaxTopOfRange`, { min: 0 }, 'N·m');
  });
  requireRange(input.hoistingTorque, 'hoistingTorque', pos, 'N·m');
  requireRange(input.inertia, 'inertia', pos, 'kg·m²');
  requireRange(input.lowerSpeed, 'lowerSpeed', pos, 'rad/s');
  requireRange(input.loadSpeed, 'loadSpeed', pos, 'm/s');
  requireRange(input.setDelay, 'setDelay', { min: 0 }, 's');
  requireRange(input.loadTorque, 'loadTorque', pos, 'N·m');
  requireRange(input.backDrivingEfficiency, 'backDrivingEfficiency', { ...pos, max: 1 });
  requireRange(input.driveTrainRating, 'driveTrainRating', pos, 'N·m');
  if (input.stoppingDistanceLimit !== undefined)
    requireRange(input.stoppingDistanceLimit, 'stoppingDistanceLimit', pos, 'm');

  const requiredBrakes = input.hotMetal && input.powerControlBraking ? 2 : 1;
  const rules = requiredBrakes === 2 ? [HOT_METAL_RULE, EACH_OF_TWO_RULE] : [];
  const checks: LimitCheck[] = [
    limitCheck({
      id: 'holding-brakes-installed',
      label: 'Holding brakes installed ≥ required by the service',
      value: input.brakes.length,
      limit: requiredBrakes,
      dimension: 'dimensionless',
      kind: 'min',
      source: requiredBrakes === 2 ? HOT_METAL_RULE : 'one holding brake per hoisting unit',
    }),
  ];
  const Md = input.loadTorque * input.backDrivingEfficiency;
  const stops: StoppingResult[] = [];
  if (input.brakes.length >= 2) {
    input.brakes.forEach((b, i) => {
      const n = i + 1;
      checks.push(
        limitCheck({
          id: `brake-${n}-holds-alone`,
          label: `Brake ${n} alone (lowest torque in service) ≥ 100 % of the full-load hoisting torque`,
          value: b.torqueMinWorn,
          limit: input.hoistingTorque,
          dimension: 'torque',
          kind: 'min',
          source: EACH_OF_TWO_RULE,
        }),
      );
      const stop = stopping(
        {
          inertia: input.inertia,
          speed: input.lowerSpeed,
          loadSpeed: input.loadSpeed,
          brakeTorque: b.torqueMinWorn,
          driveTorque: Md as Torque,
          setDelay: input.setDelay,
        },
        d,
        `brake-${n}-alone-`,
      );
      stops.push(stop);
      checks.push(
        limitCheck({
          id: `brake-${n}-stops-alone`,
          label: `Brake ${n} alone exceeds the torque of the lowering load (it stops it)`,
          value: b.torqueMinWorn,
          limit: Md,
          dimension: 'torque',
          kind: 'min',
          strict: true,
          source: 'rigid-body dynamics: the load stops only if M_b > M_L·η_bd',
        }),
      );
      if (stop.stops && input.stoppingDistanceLimit !== undefined) {
        checks.push(
          limitCheck({
            id: `brake-${n}-stopping-distance`,
            label: `Stopping distance with brake ${n} alone ≤ allowed`,
            value: stop.stoppingDistance,
            limit: input.stoppingDistanceLimit,
            dimension: 'length',
            kind: 'max',
            source: 'duty specification (user input)',
          }),
        );
      }
    });
  }
  const together = input.brakes.reduce((s, b) => s + b.torqueMaxTopOfRange, 0);
  checks.push(
    limitCheck({
      id: 'brakes-together-drive-train',
      label: 'All holding brakes together (μ max, top of range) ≤ drive-train rating',
      value: together,
      limit: input.driveTrainRating,
      dimension: 'torque',
      kind: 'max',
      source: 'equipment data (user input): drive-train torque rating at the brake shaft',
    }),
  );
  return { requiredBrakes, rules, stops, checks };
}
