import type { CriteriaSet, FieldError, SheetEvaluation } from '../core/types.js';
import type { Derivation } from '../core/step.js';
import { getLining } from '../criteria/linings.js';
import type { StoppingResult } from '../stopping/stopping.js';
import { frictionBandChart } from './charts.js';
import {
  chainWearChart,
  shoeChain,
  shoeWearLimits,
  validateChainInputs,
} from './shoe-brake-chain.js';
import { publishSteps } from './sheet-output.js';
import type { ShoeInputs } from './shoe-brake-fields.js';
import { shoeRelease, shoeSettings } from './shoe-brake-release.js';
import { shoeStop, shoeStopDistanceAndHeat, shoeStopsCheck } from './shoe-brake-stop-heat.js';
import { shoeLining, shoeTorqueChecks, shoeTorques } from './shoe-brake-torque.js';
import { evaluateShoeDiscSprings } from './shoe-disc-springs.js';
import {
  shoeDriveTrain,
  shoeDutyAtSet,
  shoeOverspeed,
  shoeTravelRatio,
} from './shoe-brake-at-set.js';
import { shoeMainSpring } from './shoe-main-spring.js';
import { shoeLevers } from './shoe-levers.js';

/** What the duty part of a sheet hands to the shoe-brake part (all SI). */
export interface ShoeDuty {
  brakeSpeed: number;
  loadSpeed: number;
  inertia: number;
  /** Torque that keeps driving the motion during the stop (lowering load, downhill), ≥ 0. */
  driveTorque: number;
  requiredTorque: number;
  requiredSource: string;
  setDelay: number;
  /** Allowed stopping distance and where it comes from; undefined = not checked. */
  stopLimit?: { value: number; source: string };
  /** Words for the stopping case, e.g. 'lowering the rated load'. */
  stopCase: string;
  /** Motor maker's maximum speed at the brake shaft, rad/s; undefined = not checked. */
  motorMaxSpeed?: number;
  /** Brakes acting on the same drive train (2 for a two-brake hoist); default 1. */
  brakesOnTrain?: number;
}

export interface ShoeOutcome {
  torquePerMu: number;
  wornFraction: number;
  torqueMaxNew: number;
  /** Lowest torque in service: μ min at the re-adjustment point, drum at its wear limit. */
  torqueMinWorn: number;
  /** Torque at μ max with new lining and the spring at the top of its adjustable range. */
  torqueMaxTopOfRange: number;
  stopMinWorn: StoppingResult;
}

/** Cross-field rules of the shoe-brake inputs, collected (not thrown one at a time). */
export function validateShoeInputs(v: ShoeInputs): FieldError[] {
  const e: FieldError[] = [];
  if (!(v.muMin <= v.muNominal))
    e.push({ field: 'muMin', message: 'μ min must not exceed μ nominal' });
  if (!(v.muNominal <= v.muMax))
    e.push({ field: 'muMax', message: 'μ max must not be below μ nominal' });
  if (!(v.springForceMax > v.springForceMin))
    e.push({ field: 'springForceMax', message: 'must exceed the lowest spring setting' });
  if (!(v.springFreeLength - v.springForceMax / v.springRate > 0)) {
    e.push({
      field: 'springFreeLength',
      message: 'the spring cannot give the highest setting force (length would reach zero)',
    });
  }
  e.push(...validateChainInputs(v));
  return e;
}

/**
 * Evaluates the brake, lining, stopping, heat, release, setting and disc-spring parts of a
 * shoe-brake sheet, section by section; each section function returns its results and this one
 * files them on the sheet in the printed order.
 */
export function evaluateShoeBrake(
  v: ShoeInputs,
  duty: ShoeDuty,
  criteria: CriteriaSet,
  d: Derivation,
  out: SheetEvaluation,
): ShoeOutcome {
  const lining = getLining(v.liningMaterial)!;
  const b = shoeTorques(v, d);
  const chain = shoeChain(v, b, d);
  const l = shoeLining(v, duty, b, chain.wearAtReadjust, d);
  const limits = shoeWearLimits(
    v,
    l.wornMin,
    chain.wearAtReadjust,
    { value: duty.requiredTorque, source: duty.requiredSource },
    d,
  );
  // The stop is worked out with the lowest torque the brake gives in service (μ min, re-adjustment
  // point, drum at its wear limit), the same torque the required-torque check holds to.
  const stop = shoeStop(duty, limits.lowestTorque, d);
  const stops = shoeStopsCheck(duty, limits.lowestTorque, stop);
  const train = shoeDriveTrain(v, duty, b, d);
  out.checks.push(
    ...shoeTorqueChecks(v, duty, b, l, lining),
    ...limits.checks,
    train.check,
    ...shoeTravelRatio(v, d),
    ...shoeDutyAtSet(v, duty, l, stop, criteria, d),
    stops.check,
    ...shoeOverspeed(duty, stop, d),
  );
  out.warnings.push(...limits.warnings);
  if (v.springRelaxation === undefined) {
    out.warnings.push(
      "Spring relaxation not entered: the worn torques, the stop and the setting band take the spring at its full set force. Enter the spring maker's figure for the service temperature.",
    );
  }
  out.charts.push(stops.chart);
  if (stop.stops) {
    const heat = shoeStopDistanceAndHeat(v, duty, stop, lining, d);
    out.checks.push(...heat.checks);
    out.charts.push(heat.chart);
  } else {
    out.warnings.push(`${stop.message} Stopping distance and heat are not computed.`);
  }

  out.checks.push(...shoeMainSpring(v, chain.clearance, d).checks);
  const rel = shoeRelease(v, b.springForce, chain, criteria, d);
  out.checks.push(...rel.checks, ...chain.checks);
  out.warnings.push(...rel.release.warnings);

  const setting = shoeSettings(
    v,
    b,
    rel.release,
    chain,
    {
      required: duty.requiredTorque,
      brakesOnTrain: duty.brakesOnTrain ?? 1,
      trainTorquePerNewton: train.torquePerNewton,
    },
    d,
  );
  out.checks.push(...setting.checks);
  out.warnings.push(...setting.warnings);
  out.tables.push(setting.table);
  out.fieldSettings.push(...setting.fieldSettings);

  evaluateShoeDiscSprings(v, criteria, d, out);
  out.checks.push(...shoeLevers(v, d));

  const torquePerMu = b.nominal / b.muNominal;
  const wornFraction = l.wornSpringForce / b.springForce;
  out.charts.push(
    chainWearChart(chain, b.nominal / b.min, duty.requiredTorque),
    frictionBandChart(
      torquePerMu,
      wornFraction,
      b.muMin,
      b.muNominal,
      b.muMax,
      duty.requiredTorque,
      v.maxBrakeTorque,
    ),
  );
  publishSteps(out, d, SHOE_PUBLISHED_STEPS);
  return {
    torquePerMu,
    wornFraction,
    torqueMaxNew: b.max,
    torqueMinWorn: limits.lowestTorque,
    torqueMaxTopOfRange: train.torquePerNewton * v.springForceMax,
    stopMinWorn: stop,
  };
}

/** Derivation steps of the shoe-brake part shown as results, in the printed order. */
const SHOE_PUBLISHED_STEPS = [
  'shoe-normal-force',
  'torque-nominal',
  'torque-min',
  'torque-max',
  'torque-max-adjustable',
  'drive-train-brake-torque',
  'worn-spring-force',
  'torque-worn-min',
  'torque-worn-nominal',
  'peak-pressure',
  'mean-pressure',
  'speed-after-delay',
  'set-speed-ratio',
  'rubbing-speed-at-set',
  'pv-at-set',
  'friction-power-at-set',
  'motor-speed-at-set',
  'max-set-delay',
  'braking-time',
  'stopping-time',
  'stopping-distance',
  'load-deceleration',
  'brake-work',
  'energy-per-hour',
  'average-heat',
  'temperature-rise',
  'steady-temperature',
  'peak-temperature',
  'thruster-force-needed',
  'thruster-force-ratio',
  'clearance-from-stroke',
  'working-stroke',
  'wear-readjust-point',
  'wear-reserve-used',
  'lining-wear-allowance',
  'torque-drum-limit',
  'spring-length',
  'spring-force-highest',
  'spring-shear-stress',
  'solid-length',
  'spring-shear-stress-solid',
  'lever-bending-stress',
  'shoe-pin-load',
  'pin-shear-stress',
  'pin-bearing-pressure',
  'base-bolt-tension',
];
