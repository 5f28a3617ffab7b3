import type {
  CriteriaSet,
  InputValue,
  SheetEvaluation,
  SheetInputs,
  SheetTypeDefinition,
} from '../core/types.js';
import { CalcInputError } from '../core/errors.js';
import { Derivation, type StepOptions } from '../core/step.js';
import { criterion, recordingCriteriaUsed } from '../criteria/lookup.js';
import { motorRatedTorque } from '../duty/motor-torque.js';
import { referLinearMass } from '../duty/referral.js';
import { inertiaTotal } from '../duty/inertia-sum.js';
import { requiredBrakeTorque } from '../duty/required-torque.js';
import { stopping } from '../stopping/stopping.js';
import { adhesionNeeded, tenPercentStoppingDistance } from '../stopping/limits.js';
import * as q from '../units/quantities.js';
import { makeCheck } from './checks.js';
import { num, qty, withBounds } from './field-builders.js';
import { TRAVEL_BOUNDS } from './field-bounds.js';
import { readInputs } from './sheet-inputs.js';
import { SHOE_FIELD_CARD } from './field-card-layouts.js';
import { finish, newEvaluation, publishSteps, SHEET_CAUTIONS } from './sheet-output.js';
import { SHOE_BRAKE_FIELDS, SHOE_SECTIONS } from './shoe-brake-fields.js';
import { evaluateShoeBrake, validateShoeInputs } from './shoe-brake-evaluate.js';
import { setDelayFields } from './set-delay-fields.js';

const U = 'duty';

export const TRAVEL_DUTY_FIELDS = [
  qty(U, 'motorPower', 'Motor rated power (one drive)', 'P', 'power', 7.5, 'kW', 'hp', {
    min: 0,
    exclusiveMin: true,
  }),
  qty(
    U,
    'motorSpeed',
    'Motor rated speed (brake on the motor shaft)',
    'n',
    'angularSpeed',
    1450,
    'rpm',
    'rpm',
    { min: 0, exclusiveMin: true, max: 6000 },
  ),
  qty(
    U,
    'travelMass',
    'Travelling mass with rated load (whole motion)',
    'm',
    'mass',
    60_000,
    'kg',
    'lb',
    { min: 0, exclusiveMin: true },
  ),
  qty(
    U,
    'unladenMass',
    'Travelling mass without the load (empty crane or trolley)',
    'm_0',
    'mass',
    52_000,
    'kg',
    'lb',
    {
      min: 0,
      exclusiveMin: true,
      required: false,
      help: 'The same brake stops the empty crane or trolley harder, so its wheels are the likelier to skid. Left empty, the sheet checks the laden case only and says so.',
    },
  ),
  qty(U, 'travelSpeed', 'Full-load travel speed', 'v', 'speed', 40, 'm/min', 'ft/min', {
    min: 0,
    exclusiveMin: true,
  }),
  num(
    U,
    'brakeCount',
    'Brakes sharing the motion (one per drive)',
    'n_br',
    2,
    { min: 1, max: 16 },
    true,
  ),
  num(U, 'wheels', 'Wheels carrying the travelling mass', 'n_wheels', 4, { min: 1, max: 64 }, true),
  num(U, 'brakedWheels', 'Driven (braked) wheels', 'n_braked', 2, { min: 1, max: 64 }, true),
  num(
    U,
    'torqueFactor',
    'Brake torque ÷ motor rated torque (set by you — check the governing standard)',
    'k',
    1.0,
    { min: 0, exclusiveMin: true, max: 5 },
  ),
  qty(
    U,
    'driveTorque',
    'Torque driving the motion at the brake shaft (slope, wind), if any',
    'M_d',
    'torque',
    0,
    'N m',
    'lbf ft',
    { min: 0 },
  ),
  qty(U, 'motorInertia', 'Motor rotor inertia', 'J_mot', 'inertia', 0.05, 'kg m^2', 'lb ft^2', {
    min: 0,
  }),
  qty(
    U,
    'brakeDrumInertia',
    'Brake drum and coupling inertia',
    'J_drum',
    'inertia',
    0.12,
    'kg m^2',
    'lb ft^2',
    { min: 0 },
  ),
  qty(
    U,
    'gearInertia',
    'Gearbox and wheel inertia at the brake shaft',
    'J_gear',
    'inertia',
    0.02,
    'kg m^2',
    'lb ft^2',
    { min: 0 },
  ),
  ...setDelayFields(3000),
] as const;

/** Shoe-brake demo values sized for the travel demo (smaller drum and spring than the hoist). */
const TRAVEL_DEMO: Record<string, InputValue> = {
  drumDiameter: { value: 200, unit: 'mm' },
  drumWearAllowance: { value: 3, unit: 'mm' },
  liningThickness: { value: 6, unit: 'mm' },
  liningMinThickness: { value: 2, unit: 'mm' },
  shoeWidth: { value: 90, unit: 'mm' },
  springForce: { value: 520, unit: 'N' },
  springRate: { value: 20, unit: 'N/mm' },
  springFreeLength: { value: 150, unit: 'mm' },
  springWireDiameter: { value: 7, unit: 'mm' },
  springMeanDiameter: { value: 47.5, unit: 'mm' },
  springActiveCoils: 11,
  springForceMin: { value: 250, unit: 'N' },
  springForceMax: { value: 800, unit: 'N' },
  maxBrakeTorque: { value: 300, unit: 'N m' },
  drumMass: { value: 12, unit: 'kg' },
  coolingArea: { value: 0.2, unit: 'm^2' },
  stopsPerHour: { value: 28, unit: '1/h' },
  emergencyStopsPerHour: { value: 2, unit: '1/h' },
  thrusterForce: { value: 220, unit: 'N' },
  leverMomentArm: { value: 100, unit: 'mm' },
  leverSectionWidth: { value: 8, unit: 'mm' },
  leverSectionDepth: { value: 30, unit: 'mm' },
  shoePinDiameter: { value: 10, unit: 'mm' },
  shoePinBearingLength: { value: 16, unit: 'mm' },
  baseBoltRowSpacing: { value: 120, unit: 'mm' },
  baseBoltAllowableLoad: { value: 3, unit: 'kN' },
};

const FIELDS = withBounds(
  [
    ...TRAVEL_DUTY_FIELDS,
    ...(SHOE_BRAKE_FIELDS.map((f) =>
      f.key in TRAVEL_DEMO ? { ...f, demo: TRAVEL_DEMO[f.key] } : f,
    ) as unknown as typeof SHOE_BRAKE_FIELDS),
  ] as const,
  TRAVEL_BOUNDS,
);

/** Evaluates the travel shoe-brake sheet: stop from full-load speed, 10 %-of-speed rule, wheel adhesion. */
export function evaluateTravelShoeBrake(
  inputs: SheetInputs,
  criteria: CriteriaSet,
): SheetEvaluation {
  const v = readInputs(FIELDS, inputs);
  const cross = validateShoeInputs(v);
  if (!(v.brakedWheels <= v.wheels))
    cross.push({ field: 'brakedWheels', message: 'cannot exceed the number of wheels' });
  if (v.unladenMass !== undefined && !(v.unladenMass <= v.travelMass))
    cross.push({
      field: 'unladenMass',
      message: 'cannot exceed the travelling mass with rated load',
    });
  if (cross.length) throw new CalcInputError(cross);
  const d = new Derivation(U);
  const out = newEvaluation('travel-shoe-brake', criteria, d, SHEET_CAUTIONS.travel);
  const omega = q.angularSpeed(v.motorSpeed);
  const vT = q.speed(v.travelSpeed);
  const Mmot = motorRatedTorque(q.power(v.motorPower), omega, d);
  const massPerBrake = q.mass(v.travelMass / v.brakeCount);
  const Jload = referLinearMass(massPerBrake, vT, omega, d, {
    label: 'Travelling mass per brake referred to the brake shaft',
    symbol: 'J_load,b',
  });
  const J = travelInertia(v, Jload, d);
  const Mreq = requiredBrakeTorque(q.ratio(v.torqueFactor), Mmot, d, 'motor');
  const frac = criterion(criteria, 'travelStopFraction');
  d.section = 'stopping';
  const sMax = tenPercentStoppingDistance(vT, d, frac.value);
  const outcome = evaluateShoeBrake(
    v,
    {
      brakeSpeed: omega,
      loadSpeed: vT,
      inertia: J,
      driveTorque: v.driveTorque,
      requiredTorque: Mreq,
      requiredSource: 'user-set torque factor × motor rated torque — check the governing standard',
      setDelay: v.setDelay,
      stopLimit: { value: sMax, source: frac.source },
      stopCase: 'travelling',
      motorMaxSpeed: v.motorMaxSpeed,
    },
    criteria,
    d,
    out,
  );
  // Wheel adhesion: the hardest stop is at μ max with new lining.
  const skid = { v, omega, vT, torque: outcome.torqueMaxNew, criteria, d, out };
  skidCheck(skid, J, v.travelMass, {
    stepPrefix: 'hard-',
    stopWords: 'hardest stop: μ max, new lining, laden',
    checkId: 'wheel-adhesion',
    label: 'Adhesion needed at μ max ≤ allowed (no wheel skid)',
    failHint: 'The wheels may skid: lower the torque, lengthen the set time, or brake more wheels.',
  });
  unladenAdhesion(skid);
  publishSteps(out, d, [
    'motor-torque',
    'inertia-total',
    'required-torque',
    'ten-percent-distance',
    'hard-load-deceleration',
    'adhesion-needed',
    'empty-adhesion-needed',
  ]);
  return finish(out);
}

type TravelInputs = ReturnType<typeof readInputs<typeof FIELDS>>;

/** Rotating parts at the brake shaft plus the travelling mass referred to it. */
function travelInertia(
  v: TravelInputs,
  load: q.Inertia,
  d: Derivation,
  options?: StepOptions,
): q.Inertia {
  return inertiaTotal(
    {
      motor: q.inertia(v.motorInertia),
      brakeDrum: q.inertia(v.brakeDrumInertia),
      gear: q.inertia(v.gearInertia),
      output: q.inertia(0),
      load,
    },
    d,
    options,
  );
}

/** What every skid case of the sheet shares: the drive, the hardest torque, where to record. */
interface SkidContext {
  v: TravelInputs;
  omega: q.AngularSpeed;
  vT: q.Speed;
  /** Brake torque at μ max with new lining (the hardest stop). */
  torque: number;
  criteria: CriteriaSet;
  d: Derivation;
  out: SheetEvaluation;
}

/**
 * The hardest stop of a travelling mass and the wheel–rail adhesion it needs, as a check: the
 * wheels carry the deceleration force and the force still driving the motion.
 */
function skidCheck(
  c: SkidContext,
  J: q.Inertia,
  mass: number,
  k: {
    stepPrefix: string;
    stopWords: string;
    /** Words for the adhesion steps of a case after the first (their ids take the prefix). */
    adhesionWords?: string;
    checkId: string;
    label: string;
    failHint: string;
    sourceNote?: string;
  },
): void {
  const { v, omega, vT, d } = c;
  d.section = 'stopping';
  const stop = stopping(
    {
      inertia: J,
      speed: omega,
      loadSpeed: vT,
      brakeTorque: q.torque(c.torque),
      driveTorque: q.torque(v.driveTorque),
      setDelay: q.time(v.setDelay),
    },
    d,
    k.stepPrefix,
    k.stopWords,
  );
  if (!stop.stops) return;
  const mu = adhesionNeeded(
    {
      mass: q.mass(mass),
      loadDeceleration: stop.loadDeceleration,
      driveTorque: q.torque(v.driveTorque),
      brakeCount: v.brakeCount,
      shaftSpeed: omega,
      loadSpeed: vT,
      brakedWheels: v.brakedWheels,
      wheels: v.wheels,
    },
    d,
    k.adhesionWords === undefined ? '' : k.stepPrefix,
    k.adhesionWords,
  );
  const lim = criterion(c.criteria, 'adhesionLimit');
  c.out.checks.push(
    makeCheck({
      id: k.checkId,
      section: 'stopping',
      label: k.label,
      value: mu,
      limit: lim.value,
      kind: 'max',
      dimension: 'dimensionless',
      source: k.sourceNote ? `${lim.source}; ${k.sourceNote}` : lim.source,
      failHint: k.failHint,
    }),
  );
}

/**
 * The empty crane or trolley: the same brake torque decelerates less mass, so the braked wheels
 * need more adhesion than when laden (common practice: skid is checked unladen). Its stop and
 * adhesion are recorded as steps of their own ('empty-…').
 */
function unladenAdhesion(c: SkidContext): void {
  const { v, d } = c;
  if (v.unladenMass === undefined) {
    c.out.warnings.push(
      'Travelling mass without the load not entered: the wheel-skid check covers the laden crane only, though the empty one skids first.',
    );
    return;
  }
  d.section = 'stopping';
  const Jload = referLinearMass(q.mass(v.unladenMass / v.brakeCount), c.vT, c.omega, d, {
    id: 'empty-load-inertia',
    label: 'Empty travelling mass per brake referred to the brake shaft',
    symbol: 'J_0,b',
  });
  const J = travelInertia(v, Jload, d, {
    id: 'empty-inertia-total',
    label: 'Total inertia referred to the brake shaft, unladen',
    symbol: 'J_eq,0',
  });
  skidCheck(c, J, v.unladenMass, {
    stepPrefix: 'empty-',
    stopWords: 'hardest stop, unladen',
    adhesionWords: 'unladen',
    checkId: 'wheel-adhesion-unladen',
    label: 'Adhesion needed at μ max, unladen ≤ allowed (no wheel skid)',
    failHint:
      'The empty crane or trolley may skid: lower the torque, lengthen the set time, or brake more wheels.',
    sourceNote: 'unladen case: common practice',
  });
}

export const travelShoeBrakeSheet: SheetTypeDefinition<'travel-shoe-brake'> = {
  id: 'travel-shoe-brake',
  title: 'Shoe brake on a travel drive',
  description:
    'Spring-set, thruster-released double-shoe brake on a bridge or trolley travel drive: torque over the friction band and at worn lining, stop from full-load speed against the 10 %-of-speed rule, wheel adhesion, heat, release and field settings.',
  sections: [{ id: U, title: 'Travel duty' }, ...SHOE_SECTIONS],
  fields: FIELDS,
  fieldCard: SHOE_FIELD_CARD,
  evaluate: recordingCriteriaUsed(evaluateTravelShoeBrake),
};
