import { stopEnergyParts } from '../energy/stop-energy.js';
import type {
  CriteriaSet,
  FieldError,
  SheetEvaluation,
  SheetInputs,
  SheetTypeDefinition,
} from '../core/types.js';
import { CalcInputError } from '../core/errors.js';
import { Derivation } from '../core/step.js';
import { criterion } from '../criteria/lookup.js';
import { getLining } from '../criteria/linings.js';
import { motorRatedTorque } from '../duty/motor-torque.js';
import { referTorque } from '../duty/referral.js';
import { hoistingTorqueFormula, holdingTorqueFormula } from '../duty/hoist-load.js';
import {
  REFERENCE_BASIS_TEXT,
  requiredBrakeTorque,
  type ReferenceBasis,
} from '../duty/required-torque.js';
import { caliperTorque, uniformWearRadius } from '../disc-brake/caliper.js';
import { padPressure } from '../disc-brake/pad-duty.js';
import { wornSpringForce } from '../shoe-brake/worn-lining.js';
import { pvFormula, rubbingSpeedFormula } from '../shoe-brake/lining-duty.js';
import { releasedSpringForceFormula, forceMarginFormula } from '../release/release.js';
import { stopping } from '../stopping/stopping.js';
import { heatBalance } from '../energy/heat-balance.js';
import { compute } from '../core/step.js';
import * as q from '../units/quantities.js';
import { makeCheck } from './checks.js';
import { frictionBandChart, stoppingChart, temperatureChart, torqueWearChart } from './charts.js';
import { readInputs, type ReadInputs } from './sheet-inputs.js';
import { finish, newEvaluation, publishSteps } from './sheet-output.js';
import { CALIPER_FIELDS, CALIPER_SECTIONS } from './caliper-disc-brake-fields.js';
import { ARRANGEMENT_KEY } from './hoist-shoe-brake.js';

function validate(v: ReadInputs): FieldError[] {
  const e: FieldError[] = [];
  if (!(v.num('padOuterRadius') > v.num('padInnerRadius')))
    e.push({ field: 'padInnerRadius', message: 'must be smaller than the pad outer radius' });
  if (!(v.num('muMin') <= v.num('muNominal')))
    e.push({ field: 'muMin', message: 'μ min must not exceed μ nominal' });
  if (!(v.num('muNominal') <= v.num('muMax')))
    e.push({ field: 'muMax', message: 'μ max must not be below μ nominal' });
  // 1 mN·m is far below any real duty; smaller values only underflow once efficiency is applied.
  if (v.str('referenceBasis') !== 'motor' && !(v.num('staticTorque') >= 1e-3))
    e.push({
      field: 'staticTorque',
      message: 'must be at least 0.001 N·m when the reference is the load torque',
    });
  if (!(v.num('clampForceMax') > v.num('clampForceMin')))
    e.push({ field: 'clampForceMax', message: 'must exceed the lowest setting' });
  if (!(v.num('clampForce') - v.num('springRate') * v.num('wear') * v.num('wearTravelRatio') > 0))
    e.push({ field: 'wear', message: 'the springs go slack before this wear: re-adjust earlier' });
  return e;
}

/** Evaluates the caliper disc-brake sheet. */
export function evaluateCaliperDiscBrake(
  inputs: SheetInputs,
  criteria: CriteriaSet,
): SheetEvaluation {
  const v = readInputs(CALIPER_FIELDS, inputs);
  const errors = validate(v);
  if (errors.length) throw new CalcInputError(errors);
  const lining = getLining(v.str('liningMaterial'))!;
  const d = new Derivation('duty');
  const out = newEvaluation('caliper-disc-brake', criteria, d);

  const omegaMot = q.angularSpeed(v.num('motorSpeed'));
  const omega = q.angularSpeed(omegaMot / v.num('ratioToBrake'));
  const Mmot = motorRatedTorque(q.power(v.num('motorPower')), omegaMot, d);
  const eta = v.num('efficiency');
  const ML = v.num('staticTorque');
  const Mhoist = compute(d, hoistingTorqueFormula, { M_L: ML, eta });
  const Mhold = compute(d, holdingTorqueFormula, { M_L: ML, eta });
  // Motor torque referred to the brake shaft without efficiency loss: the brake must hold what the motor can drive.
  const MmotB = referTorque(Mmot, q.ratio(1 / v.num('ratioToBrake')), q.ratio(1), 'driving', d, {
    id: 'motor-torque-at-brake',
    label: 'Motor rated torque referred to the brake shaft',
    symbol: 'M_mot,b',
  });
  const basis = v.str('referenceBasis') as ReferenceBasis;
  const Mref = basis === 'motor' ? MmotB : basis === 'hoisting' ? Mhoist : Mhold;
  const factor = criterion(criteria, ARRANGEMENT_KEY[v.str('brakeArrangement')]);
  const Mreq = requiredBrakeTorque(q.ratio(factor.value), q.torque(Mref), d, basis);
  const reqSource = `${factor.source}; reference: ${REFERENCE_BASIS_TEXT[basis]}`;

  d.section = 'brake';
  const re = uniformWearRadius(
    q.length(v.num('padOuterRadius')),
    q.length(v.num('padInnerRadius')),
    d,
  );
  const Fc = q.force(v.num('clampForce'));
  const zf = v.num('faces');
  const zc = v.num('calipers');
  const T = (mu: number, F: number, id: string, label: string, symbol: string) =>
    caliperTorque(q.ratio(mu), q.force(F), re, zf, zc, d, { id, label, symbol });
  const muMin = v.num('muMin'),
    muNom = v.num('muNominal'),
    muMax = v.num('muMax');
  const Mnom = T(muNom, Fc, 'torque-nominal', 'Brake torque at μ nominal, new pads', 'M_b,nom');
  const Mmin = T(muMin, Fc, 'torque-min', 'Brake torque at μ min, new pads', 'M_b,min');
  const Mmax = T(muMax, Fc, 'torque-max', 'Brake torque at μ max, new pads', 'M_b,max');
  d.section = 'lining';
  const worn = wornSpringForce(
    Fc,
    q.stiffness(v.num('springRate')),
    q.length(v.num('wear')),
    q.ratio(v.num('wearTravelRatio')),
    d,
  );
  const MwMin = T(
    muMin,
    worn.force,
    'torque-worn-min',
    'Brake torque at μ min, worn pads',
    'M_b,w,min',
  );
  T(muNom, worn.force, 'torque-worn-nominal', 'Brake torque at μ nominal, worn pads', 'M_b,w,nom');
  const p = padPressure(Fc, q.area(v.num('padArea')), d);
  const vMax = compute(
    d,
    rubbingSpeedFormula,
    { omega, D: 2 * v.num('padOuterRadius') },
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

  const tq = (id: string, label: string, value: number) =>
    makeCheck({
      id,
      section: 'brake',
      label,
      value,
      limit: Mreq,
      kind: 'min',
      dimension: 'torque',
      source: reqSource,
      failHint: 'Raise the clamp force, add a caliper, or use a larger disc.',
    });
  out.checks.push(
    tq('torque-nominal', 'Brake torque at μ nominal ≥ required', Mnom),
    tq('torque-min-friction', 'Brake torque at μ min ≥ required', Mmin),
    tq('torque-worn-min-friction', 'Brake torque at μ min and worn pads ≥ required', MwMin),
    makeCheck({
      id: 'torque-max-friction',
      section: 'brake',
      label: 'Brake torque at μ max ≤ shaft rating',
      value: Mmax,
      limit: v.num('maxBrakeTorque'),
      kind: 'max',
      dimension: 'torque',
      source: 'equipment data (user input): shaft and hub torque rating',
    }),
    makeCheck({
      id: 'pad-pressure-max',
      section: 'lining',
      label: 'Pad pressure ≤ pad maximum',
      value: p,
      limit: lining.maxPressure,
      kind: 'max',
      dimension: 'pressure',
      source: `${lining.source} (${lining.label})`,
    }),
    makeCheck({
      id: 'pad-pressure-working',
      section: 'lining',
      label: 'Pad pressure ≤ upper working pressure',
      value: p,
      limit: lining.workingPressureMax,
      kind: 'max',
      dimension: 'pressure',
      source: `${lining.source} (${lining.label})`,
    }),
    makeCheck({
      id: 'rubbing-speed',
      section: 'lining',
      label: 'Rubbing speed at the outer radius ≤ disc rating',
      value: vMax,
      limit: v.num('discMaxSpeed'),
      kind: 'max',
      dimension: 'speed',
      source: "equipment data (user input): disc maker's speed rating",
    }),
    makeCheck({
      id: 'pv',
      section: 'lining',
      label: 'p·v ≤ limit',
      value: pv,
      limit: criterion(criteria, 'pvLimit').value,
      kind: 'max',
      dimension: 'pv',
      source: criterion(criteria, 'pvLimit').source,
    }),
    makeCheck({
      id: 'stops-load',
      section: 'stopping',
      label: 'Brake torque (μ min, worn) exceeds the overhauling torque',
      value: MwMin,
      limit: Mhold,
      kind: 'min',
      strict: true,
      dimension: 'torque',
      source: 'rigid-body dynamics: the load stops only if M_b > M_d',
      failHint: 'The load is never stopped.',
    }),
  );

  d.section = 'stopping';
  const stop = stopping(
    {
      inertia: q.inertia(v.num('inertia')),
      speed: omega,
      loadSpeed: q.speed(v.num('loadSpeed')),
      brakeTorque: MwMin,
      driveTorque: Mhold,
      setDelay: q.time(v.num('setDelay')),
    },
    d,
  );
  const kv = v.num('loadSpeed') / omega;
  out.charts.push(
    stoppingChart(
      v.num('loadSpeed'),
      kv,
      v.num('setDelay'),
      stop,
      ((Mhold - MwMin) / v.num('inertia')) * kv,
    ),
  );
  if (stop.stops) {
    out.checks.push(
      makeCheck({
        id: 'stopping-distance',
        section: 'stopping',
        label: 'Stopping distance at the load ≤ allowed',
        value: stop.stoppingDistance,
        limit: v.num('maxStoppingDistance'),
        kind: 'max',
        dimension: 'length',
        source: 'duty specification (user input)',
      }),
    );
    d.section = 'thermal';
    stopEnergyParts(q.inertia(v.num('inertia')), stop.speedAfterDelay, Mhold, stop.brakingTime, d);
    const { z, Tamb, dT, Tss, tau, Tpeak } = heatBalance(
      {
        stopsPerHour: v.num('stopsPerHour'),
        stopEnergy: stop.brakeEnergy,
        mass: v.num('discMass'),
        specificHeat: v.num('specificHeat'),
        coolingCoefficient: v.num('coolingCoefficient'),
        coolingArea: v.num('coolingArea'),
        ambient: v.num('ambient'),
      },
      d,
    );
    out.checks.push(
      makeCheck({
        id: 'temperature-steady',
        section: 'thermal',
        label: 'Mean steady disc temperature ≤ pad max operating temperature',
        value: Tss,
        limit: lining.maxOperatingTemperature,
        kind: 'max',
        dimension: 'temperature',
        base: Tamb,
        source: `${lining.source} (${lining.label})`,
      }),
      makeCheck({
        id: 'temperature-peak',
        section: 'thermal',
        label: 'Peak disc temperature ≤ pad max temperature',
        value: Tpeak,
        limit: lining.maxTemperature,
        kind: 'max',
        dimension: 'temperature',
        base: Tamb,
        source: `${lining.source} (${lining.label})`,
      }),
    );
    out.charts.push(
      temperatureChart(Tamb, dT, z, tau, lining.maxTemperature, lining.maxOperatingTemperature),
    );
  } else {
    out.warnings.push(`${stop.message} Stopping distance and heat are not computed.`);
  }

  d.section = 'release';
  const Frel = compute(
    d,
    releasedSpringForceFormula,
    { F_s: Fc, k: v.num('springRate'), e: v.num('airGap'), r_s: v.num('wearTravelRatio') },
    { label: 'Spring force with the pads lifted to the air gap' },
  );
  const ratio = compute(
    d,
    forceMarginFormula,
    { F_th: v.num('releaseForce'), F_req: Frel },
    { label: 'Release force ratio (available ÷ needed)', symbol: 'n_rel' },
  );
  const rc = criterion(criteria, 'thrusterForceRatio');
  out.checks.push(
    makeCheck({
      id: 'release-force',
      section: 'release',
      label: 'Release force ÷ force needed ≥ required ratio',
      value: ratio,
      limit: rc.value,
      kind: 'min',
      dimension: 'dimensionless',
      source: rc.source,
    }),
    makeCheck({
      id: 'clamp-setting-max',
      section: 'setting',
      label: 'Clamp force within the adjustable range (upper end)',
      value: Fc,
      limit: v.num('clampForceMax'),
      kind: 'max',
      dimension: 'force',
      source: 'equipment data (user input): adjustable range of the caliper springs',
    }),
    makeCheck({
      id: 'clamp-setting-min',
      section: 'setting',
      label: 'Clamp force within the adjustable range (lower end)',
      value: Fc,
      limit: v.num('clampForceMin'),
      kind: 'min',
      dimension: 'force',
      source: 'equipment data (user input): adjustable range of the caliper springs',
    }),
  );

  const rows = [];
  for (let k = 0; k <= 10; k++) {
    const F = v.num('clampForceMin') + ((v.num('clampForceMax') - v.num('clampForceMin')) * k) / 10;
    rows.push({ clampForce: F, torqueNominal: (Mnom * F) / Fc, torqueMin: (Mmin * F) / Fc });
  }
  out.tables.push({
    id: 'clamp-setting',
    title: 'Clamp force setting table (new pads)',
    columns: [
      { key: 'clampForce', label: 'Clamp force per caliper', unit: 'N', dimension: 'force' },
      { key: 'torqueNominal', label: 'Torque at μ nominal', unit: 'N m', dimension: 'torque' },
      { key: 'torqueMin', label: 'Torque at μ min', unit: 'N m', dimension: 'torque' },
    ],
    rows,
  });
  out.fieldSettings.push(
    {
      key: 'clampForce',
      label: 'Clamp force per caliper as set',
      value: Fc,
      unit: 'N',
      dimension: 'force',
    },
    {
      key: 'airGap',
      label: 'Air gap per pad when released (equal both sides)',
      value: v.num('airGap'),
      unit: 'm',
      dimension: 'length',
    },
    {
      key: 'wear',
      label: 'Re-adjust after pad wear of',
      value: v.num('wear'),
      unit: 'm',
      dimension: 'length',
    },
  );
  out.charts.push(
    torqueWearChart(
      Mnom,
      Mmin,
      Fc,
      v.num('springRate'),
      v.num('wearTravelRatio'),
      v.num('wear'),
      Mreq,
    ),
    frictionBandChart(
      Mnom / muNom,
      worn.force / Fc,
      muMin,
      muNom,
      muMax,
      Mreq,
      v.num('maxBrakeTorque'),
    ),
  );
  publishSteps(out, d, [
    'motor-torque',
    'hoisting-torque',
    'holding-torque',
    'required-torque',
    'effective-radius',
    'torque-nominal',
    'torque-min',
    'torque-max',
    'worn-spring-force',
    'torque-worn-min',
    'pad-pressure',
    'rubbing-speed',
    'pv',
    'braking-time',
    'stopping-time',
    'stopping-distance',
    'brake-work',
    'temperature-rise',
    'steady-temperature',
    'peak-temperature',
    'released-spring-force',
    'thruster-force-ratio',
  ]);
  return finish(out);
}

export const caliperDiscBrakeSheet: SheetTypeDefinition = {
  id: 'caliper-disc-brake',
  title: 'Caliper disc brake',
  description:
    'Spring-applied caliper disc brake (demo: on a hoist rope drum): clamp force, effective radius (uniform wear), faces and calipers, torque over the friction band and at worn pads, pad duty, stop, heat, release and setting table.',
  sections: CALIPER_SECTIONS,
  fields: CALIPER_FIELDS,
  evaluate: evaluateCaliperDiscBrake,
};
