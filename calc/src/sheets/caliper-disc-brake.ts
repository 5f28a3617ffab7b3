import { recordingCriteriaUsed } from '../criteria/lookup.js';
import type {
  CriteriaSet,
  FieldError,
  SheetEvaluation,
  SheetInputs,
  SheetTypeDefinition,
} from '../core/types.js';
import { CalcInputError } from '../core/errors.js';
import { Derivation } from '../core/step.js';
import { getLining } from '../criteria/linings.js';
import { frictionBandChart, torqueWearChart } from './charts.js';
import { readInputs } from './sheet-inputs.js';
import { CALIPER_FIELD_CARD } from './field-card-layouts.js';
import { finish, newEvaluation, publishSteps, SHEET_CAUTIONS } from './sheet-output.js';
import {
  CALIPER_FIELDS,
  CALIPER_SECTIONS,
  type CaliperInputs,
} from './caliper-disc-brake-fields.js';
import { caliperAtSet, caliperConsistency } from './caliper-disc-brake-at-set.js';
import { caliperReleaseAndSetting, caliperStopAndHeat } from './caliper-disc-brake-stop.js';
import { brokenTrainErrors, caliperBrokenTrain } from './caliper-disc-brake-broken-train.js';
import {
  caliperDuty,
  caliperTorqueChecks,
  caliperTorques,
  shaftDutyErrors,
} from './caliper-disc-brake-torque.js';

function validate(v: CaliperInputs): FieldError[] {
  const e: FieldError[] = [];
  if (!(v.padOuterRadius > v.padInnerRadius))
    e.push({ field: 'padInnerRadius', message: 'must be smaller than the pad outer radius' });
  if (!(v.muMin <= v.muNominal))
    e.push({ field: 'muMin', message: 'μ min must not exceed μ nominal' });
  if (!(v.muNominal <= v.muMax))
    e.push({ field: 'muMax', message: 'μ max must not be below μ nominal' });
  e.push(...shaftDutyErrors(v), ...brokenTrainErrors(v));
  if (!(v.clampForceMax > v.clampForceMin))
    e.push({ field: 'clampForceMax', message: 'must exceed the lowest setting' });
  if (!(v.clampForce - v.springRate * v.wear * v.wearTravelRatio > 0))
    e.push({ field: 'wear', message: 'the springs go slack before this wear: re-adjust earlier' });
  return e;
}

/**
 * Evaluates the caliper disc-brake sheet section by section; each section function returns its
 * results and this one files them on the sheet in the printed order.
 */
export function evaluateCaliperDiscBrake(
  inputs: SheetInputs,
  criteria: CriteriaSet,
): SheetEvaluation {
  const v = readInputs(CALIPER_FIELDS, inputs);
  const errors = validate(v);
  if (errors.length) throw new CalcInputError(errors);
  const lining = getLining(v.liningMaterial)!;
  const d = new Derivation('duty');
  const out = newEvaluation('caliper-disc-brake', criteria, d, SHEET_CAUTIONS.caliper);

  const duty = caliperDuty(v, criteria, d);
  const t = caliperTorques(v, duty, d);
  out.checks.push(...caliperConsistency(v, duty, d), ...caliperTorqueChecks(v, duty, t, lining));
  const stop = caliperStopAndHeat(v, duty, t, lining, d);
  out.checks.push(...caliperAtSet(v, duty, t, stop.stop, criteria, d), ...stop.checks);
  out.charts.push(...stop.charts);
  out.warnings.push(...stop.warnings);
  const broken = caliperBrokenTrain(v, duty, t, lining, stop.peakTemperature, d);
  out.checks.push(...broken.checks);
  out.warnings.push(...broken.warnings);
  const setting = caliperReleaseAndSetting(v, t, criteria, d);
  out.checks.push(...setting.checks);
  out.tables.push(setting.table);
  out.fieldSettings.push(...setting.fieldSettings);

  out.charts.push(
    torqueWearChart(
      t.nominal,
      t.min,
      t.clampForce,
      v.springRate,
      v.wearTravelRatio,
      v.wear,
      duty.requiredTorque,
    ),
    frictionBandChart(
      t.nominal / v.muNominal,
      t.wornClampForce / t.clampForce,
      v.muMin,
      v.muNominal,
      v.muMax,
      duty.requiredTorque,
      v.maxBrakeTorque,
      'disc',
    ),
  );
  publishSteps(out, d, CALIPER_PUBLISHED_STEPS);
  return finish(out);
}

/** Derivation steps shown as results, in the printed order. */
const CALIPER_PUBLISHED_STEPS = [
  'motor-torque',
  'hoisting-torque',
  'holding-torque',
  'set-drive-torque',
  'required-torque',
  'implied-load-mass',
  'load-inertia-implied',
  'effective-radius',
  'torque-nominal',
  'torque-min',
  'torque-max',
  'torque-max-adjustable',
  'worn-spring-force',
  'torque-worn-min',
  'pad-pressure',
  'speed-after-delay',
  'set-speed-ratio',
  'rubbing-speed-outer-at-set',
  'pv-at-set',
  'friction-power-at-set',
  'motor-speed-at-set',
  'max-set-delay',
  'braking-time',
  'stopping-time',
  'stopping-distance',
  'brake-work',
  'temperature-rise',
  'steady-temperature',
  'peak-temperature',
  'broken-set-drive-torque',
  'broken-speed-after-delay',
  'broken-rubbing-speed-outer-at-set',
  'broken-braking-time',
  'broken-stopping-time',
  'broken-stopping-distance',
  'broken-brake-work',
  'broken-temperature-rise',
  'broken-temperature-after-stop',
  'released-spring-force',
  'thruster-force-ratio',
];

export const caliperDiscBrakeSheet: SheetTypeDefinition<'caliper-disc-brake'> = {
  id: 'caliper-disc-brake',
  title: 'Caliper disc brake',
  description:
    'Spring-applied caliper disc brake (as on a hoist rope drum or a drive shaft): clamp force, effective radius (uniform wear), faces and calipers, torque over the friction band and at worn pads, pad duty, stop, heat, release and setting table.',
  sections: CALIPER_SECTIONS,
  fields: CALIPER_FIELDS,
  fieldCard: CALIPER_FIELD_CARD,
  evaluate: recordingCriteriaUsed(evaluateCaliperDiscBrake),
};
