import type { CheckResult, CriteriaSet, FieldError } from '../core/types.js';
import { compute, type Derivation, type StepOptions } from '../core/step.js';
import { criterion } from '../criteria/lookup.js';
import type { LiningMaterial } from '../criteria/linings.js';
import { motorRatedTorque } from '../duty/motor-torque.js';
import { referTorque } from '../duty/referral.js';
import { hoistingTorqueFormula, holdingTorqueFormula } from '../duty/hoist-load.js';
import {
  REFERENCE_BASIS_TEXT,
  requiredBrakeTorque,
  type ReferenceBasis,
} from '../duty/required-torque.js';
import { backDrivenTorqueFormula } from '../stopping/speed-at-set.js';
import { caliperTorque, uniformWearRadius } from '../disc-brake/caliper.js';
import { padPressure } from '../disc-brake/pad-duty.js';
import { wornSpringForce } from '../shoe-brake/worn-lining.js';
import { pvFormula, rubbingSpeedFormula } from '../shoe-brake/lining-duty.js';
import * as q from '../units/quantities.js';
import { makeCheck } from './checks.js';
import type { CaliperInputs } from './caliper-disc-brake-fields.js';
import { arrangementKey } from './hoist-shoe-brake.js';

/** The duty at the brake shaft (section 'duty'). */
export interface CaliperDuty {
  brakeSpeed: q.AngularSpeed;
  /** Torque the overhauling load keeps driving with during the stop: M_L·η_bd. */
  driveTorque: number;
  requiredTorque: number;
  requiredSource: string;
}

/** Torques over the friction band, at worn pads, and the pads' duty (sections 'brake', 'lining'). */
export interface CaliperTorques {
  clampForce: q.Force;
  effectiveRadius: q.Length;
  nominal: q.Torque;
  min: q.Torque;
  max: q.Torque;
  wornClampForce: q.Force;
  wornMin: q.Torque;
  padPressure: number;
  rubbingSpeedOuter: number;
  pv: number;
}

/** The inputs of a duty stated at the brake shaft (the caliper sheet's, the drive shoe brake's). */
export type ShaftDutyInputs = Pick<
  CaliperInputs,
  | 'motorPower'
  | 'motorSpeed'
  | 'ratioToBrake'
  | 'staticTorque'
  | 'efficiency'
  | 'referenceBasis'
  | 'brakeArrangement'
  | 'backDrivingEfficiency'
>;

/**
 * How the load-torque steps are printed when the load is not hoisted (a conveyor's drive torque,
 * not a "hoisting torque"); the caliper sheet keeps the formulas' own words.
 */
export interface ShaftDutyWords {
  loadToDrive?: StepOptions;
  loadHeld?: StepOptions;
}

/** A load-torque reference needs a load torque: the cross-field rule of a duty at the shaft. */
export function shaftDutyErrors(v: ShaftDutyInputs): FieldError[] {
  // 1 mN·m is far below any real duty; smaller values only underflow once efficiency is applied.
  return v.referenceBasis !== 'motor' && !(v.staticTorque >= 1e-3)
    ? [
        {
          field: 'staticTorque',
          message: 'must be at least 0.001 N·m when the reference is the load torque',
        },
      ]
    : [];
}

/** Motor torque, load torques and the required brake torque at the brake shaft. */
export function caliperDuty(
  v: ShaftDutyInputs,
  criteria: CriteriaSet,
  d: Derivation,
  words: ShaftDutyWords = {},
): CaliperDuty {
  const omegaMot = q.angularSpeed(v.motorSpeed);
  const omega = q.angularSpeed(omegaMot / v.ratioToBrake);
  const Mmot = motorRatedTorque(q.power(v.motorPower), omegaMot, d);
  const eta = v.efficiency;
  const ML = v.staticTorque;
  const Mhoist = compute(d, hoistingTorqueFormula, { M_L: ML, eta }, words.loadToDrive);
  const Mhold = compute(d, holdingTorqueFormula, { M_L: ML, eta }, words.loadHeld);
  // Motor torque referred to the brake shaft without efficiency loss: the brake must hold what the
  // motor can drive. The referral's ratio runs brake shaft ÷ motor, the inverse of the sheet's i
  // (motor ÷ brake shaft), so the step prints it as i⁻¹ beside the input i it came from.
  const MmotB = referTorque(Mmot, q.ratio(1 / v.ratioToBrake), q.ratio(1), 'driving', d, {
    id: 'motor-torque-at-brake',
    label: 'Motor rated torque referred to the brake shaft (no efficiency credit)',
    symbol: 'M_mot,b',
    names: { M_out: 'M_mot', i: 'i⁻¹' },
  });
  const basis = v.referenceBasis as ReferenceBasis;
  const Mref = basis === 'motor' ? MmotB : basis === 'hoisting' ? Mhoist : Mhold;
  const factor = criterion(criteria, arrangementKey(v.brakeArrangement));
  const Mreq = requiredBrakeTorque(q.ratio(factor.value), q.torque(Mref), d, basis);
  // Emergency stop: the overhauling load back-drives the train with η_bd (no gear-loss credit).
  const Md = compute(
    d,
    backDrivenTorqueFormula,
    { M_L: ML, eta_bd: v.backDrivingEfficiency },
    { label: 'Load torque driving the brake shaft during the stop (overhauling)' },
  );
  return {
    brakeSpeed: omega,
    driveTorque: Md,
    requiredTorque: Mreq,
    requiredSource: `${factor.source}; reference: ${REFERENCE_BASIS_TEXT[basis]}`,
  };
}

/** Effective radius, torque new and worn, pad pressure, rubbing speed and p·v. */
export function caliperTorques(v: CaliperInputs, duty: CaliperDuty, d: Derivation): CaliperTorques {
  d.section = 'brake';
  const re = uniformWearRadius(q.length(v.padOuterRadius), q.length(v.padInnerRadius), d);
  const Fc = q.force(v.clampForce);
  // `names`: the worn case substitutes the worn clamp force, and prints its symbol.
  const T = (
    mu: number,
    F: number,
    id: string,
    label: string,
    symbol: string,
    names?: Record<string, string>,
  ) =>
    caliperTorque(q.ratio(mu), q.force(F), re, v.faces, v.calipers, d, {
      id,
      label,
      symbol,
      names,
    });
  const nominal = T(
    v.muNominal,
    Fc,
    'torque-nominal',
    'Brake torque at μ nominal, new pads',
    'M_b,nom',
  );
  const min = T(v.muMin, Fc, 'torque-min', 'Brake torque at μ min, new pads', 'M_b,min');
  const max = T(v.muMax, Fc, 'torque-max', 'Brake torque at μ max, new pads', 'M_b,max');
  d.section = 'lining';
  const worn = wornSpringForce(
    Fc,
    q.stiffness(v.springRate),
    q.length(v.wear),
    q.ratio(v.wearTravelRatio),
    d,
    { friction: 'pad' },
  );
  const wornMin = T(
    v.muMin,
    worn.force,
    'torque-worn-min',
    'Brake torque at μ min, worn pads',
    'M_b,w,min',
    { F_c: 'F_s,w' },
  );
  T(
    v.muNominal,
    worn.force,
    'torque-worn-nominal',
    'Brake torque at μ nominal, worn pads',
    'M_b,w,nom',
    { F_c: 'F_s,w' },
  );
  const p = padPressure(Fc, q.area(v.padArea), d);
  const omega = duty.brakeSpeed;
  const vMax = compute(
    d,
    rubbingSpeedFormula,
    { omega, D: 2 * v.padOuterRadius },
    { label: 'Rubbing speed at the pad outer radius', symbol: 'v_o' },
  );
  const vE = compute(
    d,
    rubbingSpeedFormula,
    { omega, D: 2 * re },
    {
      id: 'rubbing-speed-effective',
      label: 'Rubbing speed at the effective radius',
      symbol: 'v_e',
    },
  );
  const pv = compute(d, pvFormula, { p_m: p, v_r: vE });
  return {
    clampForce: Fc,
    effectiveRadius: re,
    nominal,
    min,
    max,
    wornClampForce: worn.force,
    wornMin,
    padPressure: p,
    rubbingSpeedOuter: vMax,
    pv,
  };
}

/** Torque against the requirement, pad pressure, and that the load stops at all (speed, p·v and the shaft rating: caliper-disc-brake-at-set.ts). */
export function caliperTorqueChecks(
  v: CaliperInputs,
  duty: CaliperDuty,
  t: CaliperTorques,
  lining: LiningMaterial,
): CheckResult[] {
  const tq = (id: string, label: string, value: number) =>
    makeCheck({
      id,
      section: 'brake',
      label,
      value,
      limit: duty.requiredTorque,
      kind: 'min',
      dimension: 'torque',
      source: duty.requiredSource,
      failHint: 'Raise the clamp force, add a caliper, or use a larger disc.',
    });
  const pad = (id: string, label: string, limit: number) =>
    makeCheck({
      id,
      section: 'lining',
      label,
      value: t.padPressure,
      limit,
      kind: 'max',
      dimension: 'pressure',
      source: `${lining.source} (${lining.label})`,
    });
  return [
    tq('torque-nominal', 'Brake torque at μ nominal ≥ required', t.nominal),
    tq('torque-min-friction', 'Brake torque at μ min ≥ required', t.min),
    tq('torque-worn-min-friction', 'Brake torque at μ min and worn pads ≥ required', t.wornMin),
    pad('pad-pressure-max', 'Pad pressure ≤ pad maximum', lining.maxPressure),
    pad('pad-pressure-working', 'Pad pressure ≤ upper working pressure', lining.workingPressureMax),
    makeCheck({
      id: 'stops-load',
      section: 'stopping',
      label: 'Brake torque (μ min, worn) exceeds the overhauling torque',
      value: t.wornMin,
      limit: duty.driveTorque,
      kind: 'min',
      strict: true,
      dimension: 'torque',
      source: 'rigid-body dynamics: the load stops only if M_b > M_d',
      failHint: 'The load is never stopped.',
    }),
  ];
}
