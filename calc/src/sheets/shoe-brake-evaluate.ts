import type { CriteriaSet, FieldError, SheetEvaluation } from '../core/types.js';
import type { Derivation } from '../core/step.js';
import { getLining } from '../criteria/linings.js';
import type { StoppingResult } from '../stopping/stopping.js';
import { frictionBandChart, torqueWearChart } from './charts.js';
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
  if (!(v.springForce - v.springRate * v.wear * v.springTravelRatio > 0)) {
    e.push({ field: 'wear', message: 'the spring goes slack before this wear: re-adjust earlier' });
  }
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
  const l = shoeLining(v, duty, b, d);
  const stop = shoeStop(duty, l.wornMin, d);
  const stops = shoeStopsCheck(duty, l.wornMin, stop);
  out.checks.push(
    ...shoeTorqueChecks(v, duty, b, l, lining),
    shoeDriveTrain(v, duty, b, d),
    ...shoeTravelRatio(v, d),
    ...shoeDutyAtSet(v, duty, l, stop, criteria, d),
    stops.check,
    ...shoeOverspeed(duty, stop, d),
  );
  out.charts.push(stops.chart);
  if (stop.stops) {
    const heat = shoeStopDistanceAndHeat(v, duty, stop, lining, d);
    out.checks.push(...heat.checks);
    out.charts.push(heat.chart);
  } else {
    out.warnings.push(`${stop.message} Stopping distance and heat are not computed.`);
  }

  const rel = shoeRelease(v, b.springForce, criteria, d);
  out.checks.push(...rel.checks);
  out.warnings.push(...rel.release.warnings);

  const setting = shoeSettings(v, b, rel.release, d);
  out.checks.push(...setting.checks);
  out.tables.push(setting.table);
  out.fieldSettings.push(...setting.fieldSettings);

  evaluateShoeDiscSprings(v, d, out);

  const torquePerMu = b.nominal / b.muNominal;
  const wornFraction = l.wornSpringForce / b.springForce;
  out.charts.push(
    torqueWearChart(
      b.nominal,
      b.min,
      b.springForce,
      v.springRate,
      v.springTravelRatio,
      v.wear,
      duty.requiredTorque,
    ),
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
  return { torquePerMu, wornFraction, torqueMaxNew: b.max, stopMinWorn: stop };
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
  'working-stroke',
  'reserve-stroke-worn',
  'wear-to-readjust',
  'spring-length',
];
