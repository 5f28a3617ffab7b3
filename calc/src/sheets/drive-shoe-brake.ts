import type {
  CriteriaSet,
  FieldError,
  SheetEvaluation,
  SheetInputs,
  SheetTypeDefinition,
} from '../core/types.js';
import { CalcInputError } from '../core/errors.js';
import { Derivation } from '../core/step.js';
import { recordingCriteriaUsed } from '../criteria/lookup.js';
import { caliperDuty, shaftDutyErrors } from './caliper-disc-brake-torque.js';
import { choice, num, qty, withBounds, type InputsOf } from './field-builders.js';
import { DRIVE_BOUNDS } from './field-bounds.js';
import { SHOE_FIELD_CARD } from './field-card-layouts.js';
import { setDelayFields } from './set-delay-fields.js';
import { readInputs } from './sheet-inputs.js';
import { finish, newEvaluation, publishSteps, SHEET_CAUTIONS } from './sheet-output.js';
import { SHOE_BRAKE_FIELDS, SHOE_SECTIONS } from './shoe-brake-fields.js';
import { evaluateShoeBrake, validateShoeInputs } from './shoe-brake-evaluate.js';

const U = 'duty';

/** The brakes of a drive: one, or a pair sharing the duty (the criteria set's factors). */
const DRIVE_ARRANGEMENT_CHOICES = [
  { value: 'single', label: 'One brake on the drive' },
  { value: 'two', label: 'Two brakes on the drive (this is one of them)' },
];

/**
 * The duty of a drive stated at the brake shaft, as a conveyor or mill-auxiliary engineer has it:
 * motor, speed ratio, the load torque (zero on the level), inertia and speed. Demo: a coil
 * conveyor rising gently, brake on the motor shaft, held to 1.5 × the motor's rated torque.
 */
export const DRIVE_DUTY_FIELDS = [
  qty(U, 'motorPower', 'Motor rated power', 'P', 'power', 15, 'kW', 'hp', {
    min: 0,
    exclusiveMin: true,
  }),
  qty(U, 'motorSpeed', 'Motor rated speed', 'n_mot', 'angularSpeed', 975, 'rpm', 'rpm', {
    min: 0,
    exclusiveMin: true,
    max: 6000,
  }),
  num(U, 'ratioToBrake', 'Speed ratio motor ÷ brake shaft (1 on the motor shaft)', 'i', 1, {
    min: 0,
    exclusiveMin: true,
    max: 5000,
  }),
  qty(
    U,
    'staticTorque',
    'Load torque at the brake shaft that keeps driving when the brake sets (incline; 0 on the level)',
    'M_L',
    'torque',
    25,
    'N m',
    'lbf ft',
    { min: 0 },
  ),
  num(U, 'efficiency', 'Efficiency between load and brake', 'η', 0.95, {
    min: 0,
    exclusiveMin: true,
    max: 1,
  }),
  choice(U, 'referenceBasis', 'Reference torque for the required torque', 'motor', [
    { value: 'motor', label: 'Motor rated torque referred to the brake shaft' },
    { value: 'hoisting', label: 'Load torque to drive the load (M_L/η)' },
    { value: 'holding', label: 'Load torque held, load overhauling (M_L·η)' },
  ]),
  choice(U, 'brakeArrangement', 'Brakes on the drive', 'single', DRIVE_ARRANGEMENT_CHOICES),
  qty(
    U,
    'inertia',
    'Total inertia referred to the brake shaft (motor, coupling, drum, gearing, load)',
    'J_eq',
    'inertia',
    4.5,
    'kg m^2',
    'lb ft^2',
    { min: 0, exclusiveMin: true },
  ),
  qty(U, 'loadSpeed', 'Load speed at rated motor speed', 'v_0', 'speed', 0.5, 'm/s', 'ft/min', {
    min: 0,
    exclusiveMin: true,
  }),
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
      help: 'No credit for gear losses while an incline drives the load in an emergency stop: leave 1 unless the gearbox maker states a back-driving efficiency (common practice).',
    },
  ),
  ...setDelayFields(3000),
  qty(
    U,
    'maxStoppingDistance',
    'Allowed stopping distance of the load (duty specification)',
    's_max',
    'length',
    1000,
    'mm',
    'in',
    { min: 0, exclusiveMin: true },
  ),
] as const;

const FIELDS = withBounds([...DRIVE_DUTY_FIELDS, ...SHOE_BRAKE_FIELDS] as const, DRIVE_BOUNDS);

type DriveInputs = InputsOf<typeof FIELDS>;

function validate(v: DriveInputs): FieldError[] {
  return [...validateShoeInputs(v), ...shaftDutyErrors(v)];
}

/**
 * Evaluates the shoe brake of a drive (conveyor, mill auxiliary): the duty at the brake shaft,
 * then the same brake, lining, stopping, heat, release, setting and disc-spring sections as the
 * crane sheets.
 */
export function evaluateDriveShoeBrake(
  inputs: SheetInputs,
  criteria: CriteriaSet,
): SheetEvaluation {
  const v = readInputs(FIELDS, inputs);
  const errors = validate(v);
  if (errors.length) throw new CalcInputError(errors);
  const d = new Derivation(U);
  const out = newEvaluation('drive-shoe-brake', criteria, d, SHEET_CAUTIONS.drive);
  const duty = caliperDuty(v, criteria, d, {
    loadToDrive: {
      label: 'Load torque to drive the load, at the brake (M_L/η)',
      symbol: 'M_drive',
    },
    loadHeld: {
      label: 'Load torque held at the brake, load overhauling (M_L·η)',
      symbol: 'M_held',
    },
  });
  evaluateShoeBrake(
    v,
    {
      brakeSpeed: duty.brakeSpeed,
      loadSpeed: v.loadSpeed,
      inertia: v.inertia,
      driveTorque: duty.driveTorque,
      motorMaxSpeed: v.motorMaxSpeed,
      requiredTorque: duty.requiredTorque,
      requiredSource: duty.requiredSource,
      setDelay: v.setDelay,
      stopLimit: { value: v.maxStoppingDistance, source: 'duty specification (user input)' },
      stopCase: 'stopping the drive from full speed',
      brakesOnTrain: v.brakeArrangement === 'two' ? 2 : 1,
    },
    criteria,
    d,
    out,
  );
  publishSteps(out, d, [
    'motor-torque',
    'motor-torque-at-brake',
    'hoisting-torque',
    'holding-torque',
    'set-drive-torque',
    'required-torque',
  ]);
  return finish(out);
}

export const driveShoeBrakeSheet: SheetTypeDefinition<'drive-shoe-brake'> = {
  id: 'drive-shoe-brake',
  title: 'Shoe brake on a drive (conveyor, mill auxiliary)',
  description:
    'Spring-set, thruster-released double-shoe brake on a conveyor or mill-auxiliary drive, its duty stated at the brake shaft: required torque, torque over the friction band and at worn lining, lining duty, stop from full speed, heat, release and stroke, field settings and disc-spring preloads.',
  sections: [{ id: U, title: 'Duty at the brake shaft' }, ...SHOE_SECTIONS],
  fields: FIELDS,
  fieldCard: SHOE_FIELD_CARD,
  evaluate: recordingCriteriaUsed(evaluateDriveShoeBrake),
};
