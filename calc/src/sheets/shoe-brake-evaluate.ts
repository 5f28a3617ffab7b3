import { stopEnergyParts } from '../energy/stop-energy.js';
import type { CriteriaSet, FieldError, SheetEvaluation } from '../core/types.js';
import { Derivation } from '../core/step.js';
import { criterion } from '../criteria/lookup.js';
import { getLining } from '../criteria/linings.js';
import { shoeNormalForce } from '../shoe-brake/shoe-force.js';
import { shortShoeTorque } from '../shoe-brake/short-shoe.js';
import {
  pivotDistance,
  pivotedPeakPressure,
  pivotedShoeTorque,
} from '../shoe-brake/pivoted-shoe.js';
import { wornSpringForce } from '../shoe-brake/worn-lining.js';
import { liningDuty } from '../shoe-brake/lining-duty.js';
import { stopping, type StoppingResult } from '../stopping/stopping.js';
import { heatBalance } from '../energy/heat-balance.js';
import { releaseAndStroke } from '../release/release.js';
import { settingTable, springLength } from '../spring-setting/setting-table.js';
import * as q from '../units/quantities.js';
import { makeCheck } from './checks.js';
import { frictionBandChart, stoppingChart, temperatureChart, torqueWearChart } from './charts.js';
import { publishSteps } from './sheet-output.js';
import type { ReadInputs } from './sheet-inputs.js';
import { evaluateShoeDiscSprings } from './shoe-disc-springs.js';

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
}

export interface ShoeOutcome {
  torquePerMu: number;
  wornFraction: number;
  torqueMaxNew: number;
  stopMinWorn: StoppingResult;
}

/** Cross-field rules of the shoe-brake inputs, collected (not thrown one at a time). */
export function validateShoeInputs(v: ReadInputs): FieldError[] {
  const e: FieldError[] = [];
  if (!(v.num('muMin') <= v.num('muNominal')))
    e.push({ field: 'muMin', message: 'μ min must not exceed μ nominal' });
  if (!(v.num('muNominal') <= v.num('muMax')))
    e.push({ field: 'muMax', message: 'μ max must not be below μ nominal' });
  if (!(v.num('springForceMax') > v.num('springForceMin')))
    e.push({ field: 'springForceMax', message: 'must exceed the lowest spring setting' });
  if (!(v.num('springFreeLength') - v.num('springForceMax') / v.num('springRate') > 0)) {
    e.push({
      field: 'springFreeLength',
      message: 'the spring cannot give the highest setting force (length would reach zero)',
    });
  }
  if (
    !(v.num('springForce') - v.num('springRate') * v.num('wear') * v.num('springTravelRatio') > 0)
  ) {
    e.push({ field: 'wear', message: 'the spring goes slack before this wear: re-adjust earlier' });
  }
  return e;
}

/** Evaluates the brake, lining, stopping, heat, release, setting and disc-spring parts of a shoe-brake sheet. */
export function evaluateShoeBrake(
  v: ReadInputs,
  duty: ShoeDuty,
  criteria: CriteriaSet,
  d: Derivation,
  out: SheetEvaluation,
): ShoeOutcome {
  const lining = getLining(v.str('liningMaterial'))!;
  const D = v.num('drumDiameter');
  const r = D / 2;
  const beta = v.num('contactAngle');
  const muMin = v.num('muMin');
  const muNom = v.num('muNominal');
  const muMax = v.num('muMax');
  const Fs = q.force(v.num('springForce'));
  const pivoted = v.str('torqueModel') === 'pivoted';

  d.section = 'brake';
  const N = shoeNormalForce(
    Fs,
    q.ratio(v.num('leverRatio')),
    q.ratio(v.num('linkageEfficiency')),
    d,
  );
  const arm = pivoted ? pivotDistance(q.length(r), q.angle(beta / 2), d) : q.length(r);
  const torqueAt = (mu: number, n: number, id: string, label: string, symbol: string) =>
    pivoted
      ? pivotedShoeTorque(q.ratio(mu), q.force(n), arm, 2, d, { id, label, symbol })
      : shortShoeTorque(q.ratio(mu), q.force(n), q.length(r), d, { id, label, symbol });
  const Mnom = torqueAt(
    muNom,
    N,
    'torque-nominal',
    'Brake torque at μ nominal, new lining',
    'M_b,nom',
  );
  const Mmin = torqueAt(muMin, N, 'torque-min', 'Brake torque at μ min, new lining', 'M_b,min');
  const Mmax = torqueAt(muMax, N, 'torque-max', 'Brake torque at μ max, new lining', 'M_b,max');

  d.section = 'lining';
  const worn = wornSpringForce(
    Fs,
    q.stiffness(v.num('springRate')),
    q.length(v.num('wear')),
    q.ratio(v.num('springTravelRatio')),
    d,
  );
  const Nw = shoeNormalForce(
    worn.force,
    q.ratio(v.num('leverRatio')),
    q.ratio(v.num('linkageEfficiency')),
    d,
    {
      id: 'shoe-normal-force-worn',
      label: 'Normal force on each shoe at worn lining',
      symbol: 'N_w',
    },
  );
  const MwMin = torqueAt(
    muMin,
    Nw,
    'torque-worn-min',
    'Brake torque at μ min, fully worn lining',
    'M_b,w,min',
  );
  const MwNom = torqueAt(
    muNom,
    Nw,
    'torque-worn-nominal',
    'Brake torque at μ nominal, fully worn lining',
    'M_b,w,nom',
  );
  const peak = pivotedPeakPressure(
    N,
    q.length(v.num('shoeWidth')),
    q.length(r),
    q.angle(beta / 2),
    d,
    { label: 'Peak lining pressure (cos θ distribution)' },
  );
  const duties = liningDuty(
    {
      normalForce: N,
      width: q.length(v.num('shoeWidth')),
      drumDiameter: q.length(D),
      contactAngle: q.angle(beta),
      brakeSpeed: q.angularSpeed(duty.brakeSpeed),
    },
    d,
  );

  d.section = 'stopping';
  const stop = stopping(
    {
      inertia: q.inertia(duty.inertia),
      speed: q.angularSpeed(duty.brakeSpeed),
      loadSpeed: q.speed(duty.loadSpeed),
      brakeTorque: MwMin,
      driveTorque: q.torque(duty.driveTorque),
      setDelay: q.time(duty.setDelay),
    },
    d,
  );

  const sec = (id: string) => id;
  const tq = (id: string, label: string, value: number) =>
    makeCheck({
      id,
      section: sec('brake'),
      label,
      value,
      limit: duty.requiredTorque,
      kind: 'min',
      dimension: 'torque',
      source: duty.requiredSource,
      failHint: 'Raise the spring setting or the lever ratio, or choose a larger brake.',
    });
  out.checks.push(
    tq('torque-nominal', 'Brake torque at μ nominal ≥ required', Mnom),
    tq('torque-min-friction', 'Brake torque at μ min ≥ required', Mmin),
    tq('torque-worn-min-friction', 'Brake torque at μ min and fully worn lining ≥ required', MwMin),
    makeCheck({
      id: 'torque-max-friction',
      section: 'brake',
      label: 'Brake torque at μ max ≤ drive-train rating',
      value: Mmax,
      limit: v.num('maxBrakeTorque'),
      kind: 'max',
      dimension: 'torque',
      source: 'equipment data (user input): drive-train torque rating at the brake shaft',
      failHint: 'The brake could overload shaft, coupling or gearbox at high friction.',
    }),
    makeCheck({
      id: 'lining-peak-pressure',
      section: 'lining',
      label: 'Peak lining pressure ≤ lining maximum',
      value: peak,
      limit: lining.maxPressure,
      kind: 'max',
      dimension: 'pressure',
      source: `${lining.source} (${lining.label})`,
    }),
    makeCheck({
      id: 'lining-mean-pressure',
      section: 'lining',
      label: 'Mean lining pressure ≤ upper working pressure',
      value: duties.meanPressure,
      limit: lining.workingPressureMax,
      kind: 'max',
      dimension: 'pressure',
      source: `${lining.source} (${lining.label})`,
    }),
    makeCheck({
      id: 'rubbing-speed',
      section: 'lining',
      label: 'Rubbing speed ≤ drum rating',
      value: duties.rubbingSpeed,
      limit: v.num('drumMaxSpeed'),
      kind: 'max',
      dimension: 'speed',
      source: "equipment data (user input): drum maker's peripheral speed rating",
    }),
    makeCheck({
      id: 'pv',
      section: 'lining',
      label: 'p·v ≤ limit',
      value: duties.pv,
      limit: criterion(criteria, 'pvLimit').value,
      kind: 'max',
      dimension: 'pv',
      source: criterion(criteria, 'pvLimit').source,
    }),
    makeCheck({
      id: 'stops-load',
      section: 'stopping',
      label: `Brake torque (μ min, worn) exceeds the driving torque while ${duty.stopCase}`,
      value: MwMin,
      limit: duty.driveTorque,
      kind: 'min',
      strict: true,
      dimension: 'torque',
      source: 'rigid-body dynamics: the load stops only if M_b > M_d',
      failHint: 'The load is never stopped.',
    }),
  );

  const kv = duty.loadSpeed / duty.brakeSpeed;
  out.charts.push(
    stoppingChart(
      duty.loadSpeed,
      kv,
      duty.setDelay,
      stop,
      ((duty.driveTorque - MwMin) / duty.inertia) * kv,
    ),
  );
  const thermalLining = lining;
  if (stop.stops) {
    if (duty.stopLimit) {
      out.checks.push(
        makeCheck({
          id: 'stopping-distance',
          section: 'stopping',
          label: 'Stopping distance at the load ≤ allowed',
          value: stop.stoppingDistance,
          limit: duty.stopLimit.value,
          kind: 'max',
          dimension: 'length',
          source: duty.stopLimit.source,
        }),
      );
    }
    d.section = 'thermal';
    stopEnergyParts(
      q.inertia(duty.inertia),
      stop.speedAfterDelay,
      duty.driveTorque,
      stop.brakingTime,
      d,
    );
    const { z, Tamb, dT, Tss, tau, Tpeak } = heatBalance(
      {
        stopsPerHour: v.num('stopsPerHour'),
        stopEnergy: stop.brakeEnergy,
        mass: v.num('drumMass'),
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
        label: 'Mean steady drum temperature ≤ lining max operating temperature',
        value: Tss,
        limit: thermalLining.maxOperatingTemperature,
        kind: 'max',
        dimension: 'temperature',
        base: Tamb,
        source: `${thermalLining.source} (${thermalLining.label})`,
      }),
      makeCheck({
        id: 'temperature-peak',
        section: 'thermal',
        label: 'Peak drum temperature ≤ lining max temperature',
        value: Tpeak,
        limit: thermalLining.maxTemperature,
        kind: 'max',
        dimension: 'temperature',
        base: Tamb,
        source: `${thermalLining.source} (${thermalLining.label})`,
      }),
    );
    out.charts.push(
      temperatureChart(
        Tamb,
        dT,
        z,
        tau,
        thermalLining.maxTemperature,
        thermalLining.maxOperatingTemperature,
      ),
    );
  } else {
    out.warnings.push(`${stop.message} Stopping distance and heat are not computed.`);
  }

  d.section = 'release';
  const rel = releaseAndStroke(
    {
      springForce: Fs,
      springRate: q.stiffness(v.num('springRate')),
      clearance: q.length(v.num('clearance')),
      springTravelRatio: q.ratio(v.num('springTravelRatio')),
      thrusterTravelRatio: q.ratio(v.num('thrusterTravelRatio')),
      efficiency: q.ratio(v.num('releaseEfficiency')),
      thrusterForce: q.force(v.num('thrusterForce')),
      nominalStroke: q.length(v.num('thrusterStroke')),
      reserveStroke: q.length(v.num('reserveStroke')),
      wear: q.length(v.num('wear')),
      minReserveStroke: q.length(v.num('minReserveStroke')),
    },
    d,
  );
  const ratioCrit = criterion(criteria, 'thrusterForceRatio');
  out.checks.push(
    makeCheck({
      id: 'thruster-force',
      section: 'release',
      label: 'Thruster force ÷ force needed ≥ required ratio',
      value: rel.forceRatio,
      limit: ratioCrit.value,
      kind: 'min',
      dimension: 'dimensionless',
      source: ratioCrit.source,
      failHint: 'Choose a stronger thruster or lower the spring setting.',
    }),
    makeCheck({
      id: 'reserve-stroke-worn',
      section: 'release',
      label: 'Reserve stroke at fully worn lining ≥ minimum',
      value: rel.wornReserveStroke,
      limit: v.num('minReserveStroke'),
      kind: 'min',
      dimension: 'length',
      source: "equipment data (user input): thruster maker's minimum reserve stroke",
      failHint:
        'At zero reserve the brake loses torque: re-adjust earlier or set a larger reserve.',
    }),
    makeCheck({
      id: 'stroke-headroom',
      section: 'release',
      label: 'Thruster stroke left above the released position ≥ 0',
      value: rel.headroom,
      limit: 0,
      kind: 'min',
      dimension: 'length',
      source: REF_STROKE,
    }),
  );
  out.warnings.push(...rel.warnings);

  d.section = 'setting';
  const Ls = springLength(
    q.length(v.num('springFreeLength')),
    Fs,
    q.stiffness(v.num('springRate')),
    d,
  );
  out.checks.push(
    makeCheck({
      id: 'spring-setting-max',
      section: 'setting',
      label: 'Spring force within the adjustable range (upper end)',
      value: Fs,
      limit: v.num('springForceMax'),
      kind: 'max',
      dimension: 'force',
      source: 'equipment data (user input): adjustable range of the brake spring',
    }),
    makeCheck({
      id: 'spring-setting-min',
      section: 'setting',
      label: 'Spring force within the adjustable range (lower end)',
      value: Fs,
      limit: v.num('springForceMin'),
      kind: 'min',
      dimension: 'force',
      source: 'equipment data (user input): adjustable range of the brake spring',
    }),
  );
  const torquePerMu = Mnom / muNom;
  const rows = settingTable(
    v.num('springForceMin'),
    v.num('springForceMax'),
    v.num('springFreeLength'),
    v.num('springRate'),
    Mnom / Fs,
    Mmin / Fs,
    11,
  );
  out.tables.push({
    id: 'spring-setting',
    title: 'Spring setting table (new lining)',
    columns: [
      { key: 'springForce', label: 'Spring force', unit: 'N', dimension: 'force' },
      { key: 'springLength', label: 'Spring length', unit: 'm', dimension: 'length' },
      { key: 'torqueNominal', label: 'Torque at μ nominal', unit: 'N m', dimension: 'torque' },
      { key: 'torqueMin', label: 'Torque at μ min', unit: 'N m', dimension: 'torque' },
    ],
    rows,
  });
  out.fieldSettings.push(
    {
      key: 'springLength',
      label: 'Main spring length as set',
      value: Ls,
      unit: 'm',
      dimension: 'length',
      note: 'Measure with new lining, brake applied.',
    },
    {
      key: 'springForce',
      label: 'Main spring force as set',
      value: Fs,
      unit: 'N',
      dimension: 'force',
    },
    {
      key: 'shoeClearance',
      label: 'Shoe clearance when released (each side, equal)',
      value: v.num('clearance'),
      unit: 'm',
      dimension: 'length',
    },
    {
      key: 'workingStroke',
      label: 'Thruster working stroke',
      value: rel.workingStroke,
      unit: 'm',
      dimension: 'length',
    },
    {
      key: 'reserveStroke',
      label: 'Reserve stroke to set (new lining)',
      value: v.num('reserveStroke'),
      unit: 'm',
      dimension: 'length',
    },
    {
      key: 'minReserveStroke',
      label: 'Re-adjust before the reserve stroke falls below',
      value: v.num('minReserveStroke'),
      unit: 'm',
      dimension: 'length',
    },
    {
      key: 'wearToReadjust',
      label: 'Lining wear per shoe until re-adjustment',
      value: rel.wearToReadjust,
      unit: 'm',
      dimension: 'length',
    },
  );

  evaluateShoeDiscSprings(v, d, out);

  out.charts.push(
    torqueWearChart(
      Mnom,
      Mmin,
      Fs,
      v.num('springRate'),
      v.num('springTravelRatio'),
      v.num('wear'),
      duty.requiredTorque,
    ),
    frictionBandChart(
      torquePerMu,
      worn.force / Fs,
      muMin,
      muNom,
      muMax,
      duty.requiredTorque,
      v.num('maxBrakeTorque'),
    ),
  );
  publishSteps(out, d, [
    'shoe-normal-force',
    'torque-nominal',
    'torque-min',
    'torque-max',
    'worn-spring-force',
    'torque-worn-min',
    'torque-worn-nominal',
    'peak-pressure',
    'mean-pressure',
    'rubbing-speed',
    'pv',
    'speed-after-delay',
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
  ]);
  void MwNom;
  return { torquePerMu, wornFraction: worn.force / Fs, torqueMaxNew: Mmax, stopMinWorn: stop };
}

const REF_STROKE = "stroke budget (common practice; the thruster maker's data governs)";
