import type { CheckResult, FieldError } from '../core/types.js';
import { caseStep, compute, type Derivation } from '../core/step.js';
import type { LiningMaterial } from '../criteria/linings.js';
import { G_STANDARD } from '../duty/hoist-load.js';
import { kinematicRadiusFormula, loadInertiaFromTorqueFormula } from '../duty/load-consistency.js';
import { temperatureAfterStopFormula, temperatureRiseFormula } from '../energy/heat.js';
import { rubbingSpeedFormula } from '../shoe-brake/lining-duty.js';
import { backDrivenTorqueFormula } from '../stopping/speed-at-set.js';
import { stopping } from '../stopping/stopping.js';
import { formatForDerivation } from '../units/format.js';
import * as q from '../units/quantities.js';
import { makeCheck } from './checks.js';
import type { CaliperInputs } from './caliper-disc-brake-fields.js';
import type { CaliperDuty, CaliperTorques } from './caliper-disc-brake-torque.js';

const PREFIX = 'broken-';
const WORDS = 'drive train broken';

/** Beside every check of the case: no standard this core cites asks for it. */
export const BROKEN_TRAIN_SOURCE =
  'drive-train-broken case: common practice for a secondary (emergency) brake on a hoist rope drum, no standard cited here; defer to the governing standard';

/** Warning of a sheet whose brake is off the motor shaft and whose J_dr is empty. */
export const BROKEN_TRAIN_UNCHECKED =
  'Drive train broken is not checked: a brake off the motor shaft, as on a rope drum, is there above all for a broken shaft, coupling or gearbox between motor and brake, when the load overhauls with the motor side gone. Enter the inertia left on the brake side (drum, disc, ropes, load) referred to the brake shaft, J_dr, to check that stop (common practice; defer to the governing standard).';

/**
 * J_dr must lie between the hoisted load's own inertia and the whole train's: below the first it
 * leaves out the load the brake has to stop, above the second it claims more than is there.
 */
export function brokenTrainErrors(v: CaliperInputs): FieldError[] {
  const J = v.brokenTrainInertia;
  if (J === undefined) return [];
  const omega = (v.motorSpeed as number) / v.ratioToBrake;
  const r_k = compute(undefined, kinematicRadiusFormula, { v_0: v.loadSpeed, omega_b: omega });
  const J_L = compute(undefined, loadInertiaFromTorqueFormula, {
    M_L: v.staticTorque,
    r_k,
    g: G_STANDARD,
  });
  const e: FieldError[] = [];
  if (!(J >= J_L))
    e.push({
      field: 'brokenTrainInertia',
      message: `must be at least the hoisted load's own inertia at the brake shaft, J_L = M_L·r_k/g = ${formatForDerivation(J_L, 'inertia')}`,
    });
  if (!(J <= v.inertia))
    e.push({
      field: 'brokenTrainInertia',
      message: 'must not exceed the total inertia referred to the brake shaft',
    });
  return e;
}

/**
 * The stop when the drive train breaks between motor and drum: motor inertia and motor torque
 * are gone, the load overhauls what is left (J_dr) with no gear-loss credit, and the brake sets
 * after its delay at its lowest torque in service, the torque of the sheet's own stop. The same
 * stopping() as the normal stop, its steps prefixed 'broken-'.
 */
export function caliperBrokenTrain(
  v: CaliperInputs,
  duty: CaliperDuty,
  t: CaliperTorques,
  lining: LiningMaterial,
  /** Peak bulk disc temperature of normal duty, K (undefined when the normal stop has no heat). */
  peakTemperature: number | undefined,
  d: Derivation,
): { checks: CheckResult[]; warnings: string[] } {
  const J = v.brokenTrainInertia;
  if (J === undefined) {
    // On the motor shaft (i = 1) a break between motor and drum takes the brake away with the
    // motor: no brake is left on the drum side, and this case is not the brake's to check.
    return { checks: [], warnings: v.ratioToBrake === 1 ? [] : [BROKEN_TRAIN_UNCHECKED] };
  }
  d.section = 'stopping';
  const o = (f: { spec: { id: string; label: string } }) => caseStep(f, PREFIX, WORDS);
  // The gearbox is no longer between load and brake: η_bd = 1 whatever the sheet's input says.
  const Md = compute(
    d,
    backDrivenTorqueFormula,
    { M_L: v.staticTorque, eta_bd: 1 },
    o(backDrivenTorqueFormula),
  );
  const stop = stopping(
    {
      inertia: q.inertia(J),
      speed: duty.brakeSpeed,
      loadSpeed: q.speed(v.loadSpeed),
      brakeTorque: t.wornMin,
      driveTorque: q.torque(Md),
      setDelay: q.time(v.setDelay),
    },
    d,
    PREFIX,
    WORDS,
    { J: 'J_dr' },
  );
  const checks = [
    makeCheck({
      id: 'broken-stops-load',
      section: 'stopping',
      label: 'Drive train broken: brake torque (μ min, worn) exceeds the load torque (η_bd = 1)',
      value: t.wornMin,
      limit: Md,
      kind: 'min',
      strict: true,
      dimension: 'torque',
      source: `rigid-body dynamics: the load stops only if M_b > M_L, no gear-loss credit with the gearbox out of the path; ${BROKEN_TRAIN_SOURCE}`,
      failHint:
        'With the drive train broken this brake never stops the load: raise the clamp force, add a caliper or use a larger disc.',
    }),
  ];
  if (!stop.stops) return { checks, warnings: [`Drive train broken: ${stop.message}`] };
  // The motor is disconnected: its overspeed is no longer this brake's concern, the disc's is.
  const vOuter = compute(
    d,
    rubbingSpeedFormula,
    { omega: stop.speedAfterDelay, D: 2 * v.padOuterRadius },
    {
      id: 'broken-rubbing-speed-outer-at-set',
      label: `Rubbing speed at the pad outer radius when the brake sets — ${WORDS}`,
      symbol: 'v_o,dr',
      names: { omega: 'ω_1' },
    },
  );
  checks.push(
    makeCheck({
      id: 'broken-stopping-distance',
      section: 'stopping',
      label:
        'Drive train broken: stopping distance at the load (set delay from the break) ≤ allowed',
      value: stop.stoppingDistance,
      limit: v.maxStoppingDistance,
      kind: 'max',
      dimension: 'length',
      source: `duty specification (user input); ${BROKEN_TRAIN_SOURCE}`,
      failHint:
        "The drum runs away during the set delay: shorten the set delay (release unit at its slowest: maker's data) or raise the brake torque.",
    }),
    makeCheck({
      id: 'broken-rubbing-speed',
      section: 'stopping',
      label:
        'Drive train broken: rubbing speed at the outer radius when the brake sets ≤ disc rating',
      value: vOuter,
      limit: v.discMaxSpeed,
      kind: 'max',
      dimension: 'speed',
      source: `equipment data (user input): disc maker's speed rating; ${BROKEN_TRAIN_SOURCE}`,
    }),
  );
  if (peakTemperature === undefined) return { checks, warnings: [] };
  d.section = 'thermal';
  const dT = compute(
    d,
    temperatureRiseFormula,
    { E: stop.brakeEnergy, m: v.discMass, c: v.specificHeat },
    o(temperatureRiseFormula),
  );
  // The break may come right after a normal stop (stop, restart, break): start from that peak.
  const T1 = compute(
    d,
    temperatureAfterStopFormula,
    { T_0: peakTemperature, dT },
    { ...o(temperatureAfterStopFormula), names: { T_0: 'T_peak' } },
  );
  checks.push(
    makeCheck({
      id: 'broken-temperature',
      section: 'thermal',
      label:
        'Drive train broken: bulk disc temperature after the stop, from the peak of normal duty ≤ pad max operating temperature',
      value: T1,
      limit: lining.maxOperatingTemperature,
      kind: 'max',
      dimension: 'temperature',
      base: v.ambient,
      source: `${lining.source} (${lining.label}), max operating temperature (μ min relied on during the stop); ${BROKEN_TRAIN_SOURCE}`,
    }),
  );
  return { checks, warnings: [] };
}
