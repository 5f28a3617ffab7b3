import type {
  CriteriaSet,
  SheetEvaluation,
  SheetInputs,
  SheetTypeDefinition,
} from '../core/types.js';
import { CalcInputError } from '../core/errors.js';
import { compute, Derivation } from '../core/step.js';
import { backDrivenTorqueFormula } from '../stopping/speed-at-set.js';
import { criterion, recordingCriteriaUsed } from '../criteria/lookup.js';
import { motorRatedTorque } from '../duty/motor-torque.js';
import { hoistLoadSpeed, hoistLoadTorques } from '../duty/hoist-load.js';
import { referLinearMass, referRotatingInertia } from '../duty/referral.js';
import { inertiaTotal } from '../duty/inertia-sum.js';
import {
  REFERENCE_BASIS_TEXT,
  requiredBrakeTorque,
  type ReferenceBasis,
} from '../duty/required-torque.js';
import * as q from '../units/quantities.js';
import { choice, num, qty, withBounds } from './field-builders.js';
import { HOIST_BOUNDS } from './field-bounds.js';
import { setDelayFields } from './set-delay-fields.js';
import { readInputs } from './sheet-inputs.js';
import { SHOE_FIELD_CARD } from './field-card-layouts.js';
import { finish, newEvaluation, publishSteps, SHEET_CAUTIONS } from './sheet-output.js';
import { SHOE_BRAKE_FIELDS, SHOE_SECTIONS } from './shoe-brake-fields.js';
import { evaluateShoeBrake, validateShoeInputs } from './shoe-brake-evaluate.js';
import {
  HOIST_SERVICE_FIELDS,
  hoistRedundancy,
  withoutRepeatedStops,
  hoistTestRequirements,
} from './hoist-redundancy.js';

const U = 'duty';

export const ARRANGEMENT_CHOICES = [
  { value: 'single', label: 'One holding brake, control braking other than mechanical' },
  { value: 'mechanical', label: 'One holding brake with mechanical control braking' },
  { value: 'two', label: 'Two holding brakes (this is one of them)' },
];
export const ARRANGEMENT_KEY: Record<string, string> = {
  single: 'torqueFactorSingle',
  mechanical: 'torqueFactorMechanical',
  two: 'torqueFactorEachOfTwo',
};

/** The torque-factor criterion of a brake arrangement; readInputs admits only ARRANGEMENT_CHOICES. */
export function arrangementKey(arrangement: string): string {
  const key = ARRANGEMENT_KEY[arrangement];
  if (key === undefined) throw new Error(`brake arrangement "${arrangement}" has no criterion key`);
  return key;
}

export const HOIST_DUTY_FIELDS = [
  qty(U, 'motorPower', 'Motor rated power', 'P', 'power', 22, 'kW', 'hp', {
    min: 0,
    exclusiveMin: true,
  }),
  qty(
    U,
    'motorSpeed',
    'Motor rated speed (brake on the motor shaft)',
    'n',
    'angularSpeed',
    975,
    'rpm',
    'rpm',
    { min: 0, exclusiveMin: true, max: 6000 },
  ),
  qty(U, 'load', 'Rated load', 'm_L', 'mass', 10_000, 'kg', 'lb', { min: 0, exclusiveMin: true }),
  qty(U, 'hookBlock', 'Hook block and ropes', 'm_H', 'mass', 300, 'kg', 'lb', { min: 0 }),
  qty(U, 'ropeDrumDiameter', 'Rope drum pitch diameter', 'D_drum', 'length', 500, 'mm', 'in', {
    min: 0,
    exclusiveMin: true,
  }),
  num(U, 'reeving', 'Reeving ratio (hook load ÷ rope pull at the drum)', 'i_r', 4, {
    min: 0,
    exclusiveMin: true,
    max: 32,
  }),
  num(U, 'gearRatio', 'Gear ratio (brake shaft ÷ drum speed)', 'i_g', 40, {
    min: 0,
    exclusiveMin: true,
    max: 2000,
  }),
  num(U, 'efficiency', 'Overall efficiency of gear and reeving', 'η', 0.88, {
    min: 0,
    exclusiveMin: true,
    max: 1,
  }),
  choice(
    U,
    'referenceBasis',
    'Reference torque for the required torque',
    'hoisting',
    [
      { value: 'hoisting', label: 'Rated-load hoisting torque at the brake (M_L/η)' },
      { value: 'holding', label: 'Static holding torque while lowering (M_L·η)' },
      { value: 'motor', label: 'Motor rated torque' },
    ],
    '29 CFR 1910.179(f) states hoist holding-brake torque as a percentage of the rated-load hoisting torque at the brake.',
  ),
  choice(U, 'brakeArrangement', 'Holding brake arrangement', 'two', ARRANGEMENT_CHOICES),
  ...HOIST_SERVICE_FIELDS,
  qty(U, 'motorInertia', 'Motor rotor inertia', 'J_mot', 'inertia', 0.45, 'kg m^2', 'lb ft^2', {
    min: 0,
  }),
  qty(
    U,
    'brakeDrumInertia',
    'Brake drum and coupling inertia',
    'J_drum',
    'inertia',
    1.2,
    'kg m^2',
    'lb ft^2',
    { min: 0 },
  ),
  qty(
    U,
    'gearInertia',
    'Gearbox inertia at the brake shaft',
    'J_gear',
    'inertia',
    0.05,
    'kg m^2',
    'lb ft^2',
    { min: 0 },
  ),
  qty(
    U,
    'ropeDrumInertia',
    'Rope drum inertia (at drum speed)',
    'J_rd',
    'inertia',
    30,
    'kg m^2',
    'lb ft^2',
    { min: 0 },
  ),
  num(
    U,
    'backDrivingEfficiency',
    'Efficiency of the drive train driven backwards by the load (emergency stop)',
    'η_bd',
    1,
    {
      min: 0,
      exclusiveMin: true,
      max: 1,
      help: 'No credit for gear losses while lowering in an emergency stop: leave 1 unless the gearbox maker states a back-driving efficiency (common practice).',
    },
  ),
  ...setDelayFields(2200),
  qty(
    U,
    'maxStoppingDistance',
    'Allowed stopping distance while lowering (duty specification)',
    's_max',
    'length',
    250,
    'mm',
    'in',
    { min: 0, exclusiveMin: true },
  ),
] as const;

const FIELDS = withBounds([...HOIST_DUTY_FIELDS, ...SHOE_BRAKE_FIELDS] as const, HOIST_BOUNDS);

/** Evaluates the hoist shoe-brake sheet: the worst stop is lowering the rated load. */
export function evaluateHoistShoeBrake(
  inputs: SheetInputs,
  criteria: CriteriaSet,
): SheetEvaluation {
  const v = readInputs(FIELDS, inputs);
  const cross = validateShoeInputs(v);
  if (cross.length) throw new CalcInputError(cross);
  const d = new Derivation(U);
  const out = newEvaluation('hoist-shoe-brake', criteria, d, SHEET_CAUTIONS.hoist);
  const omega = q.angularSpeed(v.motorSpeed);
  const Mmot = motorRatedTorque(q.power(v.motorPower), omega, d);
  const load = hoistLoadTorques(
    {
      load: q.mass(v.load),
      hookBlock: q.mass(v.hookBlock),
      drumDiameter: q.length(v.ropeDrumDiameter),
      reeving: q.ratio(v.reeving),
      gearRatio: q.ratio(v.gearRatio),
      efficiency: q.ratio(v.efficiency),
    },
    d,
  );
  const vL = hoistLoadSpeed(
    omega,
    q.length(v.ropeDrumDiameter),
    q.ratio(v.reeving),
    q.ratio(v.gearRatio),
    d,
  );
  const Jout = referRotatingInertia(
    q.inertia(v.ropeDrumInertia),
    q.angularSpeed(omega / v.gearRatio),
    omega,
    d,
    { label: 'Rope drum inertia referred to the brake shaft', symbol: 'J_out,b' },
  );
  const Jload = referLinearMass(q.mass(v.load + v.hookBlock), vL, omega, d, {
    label: 'Load and hook block referred to the brake shaft',
    symbol: 'J_load,b',
  });
  const J = inertiaTotal(
    {
      motor: q.inertia(v.motorInertia),
      brakeDrum: q.inertia(v.brakeDrumInertia),
      gear: q.inertia(v.gearInertia),
      output: Jout,
      load: Jload,
    },
    d,
  );
  const basis = v.referenceBasis as ReferenceBasis;
  const Mref =
    basis === 'motor' ? Mmot : basis === 'hoisting' ? load.hoistingTorque : load.holdingTorque;
  const factor = criterion(criteria, arrangementKey(v.brakeArrangement));
  const Mreq = requiredBrakeTorque(q.ratio(factor.value), Mref, d, basis);
  out.warnings.push(
    `Required torque = ${factor.value} × ${REFERENCE_BASIS_TEXT[basis]}; efficiency credit: hoisting torque divides by η, holding torque multiplies by η.`,
  );
  // Emergency stop while lowering: the load back-drives the train with η_bd (no gear-loss credit).
  const Md = compute(
    d,
    backDrivenTorqueFormula,
    { M_L: load.staticTorque, eta_bd: v.backDrivingEfficiency },
    { label: 'Load torque driving the brake shaft during the stop (lowering)' },
  );
  const brakesInstalled = v.brakeArrangement === 'two' ? 2 : 1;
  const shoe = evaluateShoeBrake(
    v,
    {
      brakeSpeed: omega,
      loadSpeed: vL,
      inertia: J,
      driveTorque: Md,
      motorMaxSpeed: v.motorMaxSpeed,
      requiredTorque: Mreq,
      requiredSource: `${factor.source}; reference: ${REFERENCE_BASIS_TEXT[basis]}`,
      setDelay: v.setDelay,
      stopLimit: { value: v.maxStoppingDistance, source: 'duty specification (user input)' },
      stopCase: 'lowering the rated load',
      brakesOnTrain: brakesInstalled,
    },
    criteria,
    d,
    out,
  );
  const red = hoistRedundancy({
    hotMetal: v.hotMetal,
    powerControlBraking: v.powerControlBraking,
    brakesInstalled,
    brake: {
      torqueMinWorn: q.torque(shoe.torqueMinWorn),
      torqueMaxTopOfRange: q.torque(shoe.torqueMaxTopOfRange),
    },
    hoistingTorque: load.hoistingTorque,
    staticTorque: load.staticTorque,
    inertia: J,
    lowerSpeed: omega,
    loadSpeed: vL,
    setDelay: v.setDelay,
    stoppingDistanceLimit: v.maxStoppingDistance,
    driveTrainRating: v.maxBrakeTorque,
  });
  const each = withoutRepeatedStops(red.checks, out.checks);
  out.checks.unshift(...each.checks);
  out.warnings.push(
    ...red.warnings,
    ...each.notes,
    ...hoistTestRequirements({ ratedLoad: v.load, requiredTorque: Mreq, brakesInstalled }),
  );
  publishSteps(out, d, [
    'motor-torque',
    'hoist-static-torque',
    'hoisting-torque',
    'holding-torque',
    'set-drive-torque',
    'hoist-load-speed',
    'inertia-total',
    'required-torque',
  ]);
  return finish(out);
}

export const hoistShoeBrakeSheet: SheetTypeDefinition<'hoist-shoe-brake'> = {
  id: 'hoist-shoe-brake',
  title: 'Shoe brake on a hoist',
  description:
    'Spring-set, thruster-released double-shoe brake on the motor shaft of a crane hoist: required torque, torque over the friction band and at worn lining, lining duty, stop while lowering the rated load, heat, release and stroke, field settings and disc-spring preloads.',
  sections: [{ id: U, title: 'Hoist duty' }, ...SHOE_SECTIONS],
  fields: FIELDS,
  fieldCard: SHOE_FIELD_CARD,
  evaluate: recordingCriteriaUsed(evaluateHoistShoeBrake),
};
