import type { CheckResult, CriteriaSet } from '../core/types.js';
import { compute, type Derivation } from '../core/step.js';
import { driveTrainOverload } from '../duty/drive-train-overload.js';
import { loadConsistency } from '../duty/load-consistency.js';
import { rubbingSpeedFormula } from '../shoe-brake/lining-duty.js';
import { dutyAtSet } from '../stopping/speed-at-set.js';
import type { StoppingResult } from '../stopping/stopping.js';
import * as q from '../units/quantities.js';
import { makeCheck, sheetCheck } from './checks.js';
import { overspeedAtSet, pvAtSetCheck } from './at-set-checks.js';
import type { CaliperInputs } from './caliper-disc-brake-fields.js';
import type { CaliperDuty, CaliperTorques } from './caliper-disc-brake-torque.js';

/**
 * Static torque, load speed and inertia of the caliper sheet are free inputs: checked here for a
 * hoisted load (section 'duty') so that energy and stopping distance describe one machine.
 */
export function caliperConsistency(v: CaliperInputs, duty: CaliperDuty, d: Derivation) {
  d.section = 'duty';
  const r = loadConsistency(
    {
      staticTorque: q.torque(v.staticTorque),
      loadSpeed: q.speed(v.loadSpeed),
      brakeSpeed: duty.brakeSpeed,
      inertia: q.inertia(v.inertia),
      loadMass: v.loadMass === undefined ? undefined : q.mass(v.loadMass),
    },
    d,
  );
  return r.checks.map((c) =>
    sheetCheck(
      c,
      'duty',
      'Static torque, load speed and inertia do not describe the same hoist: check each against the drive data.',
    ),
  );
}

/**
 * Pad duty at the speed the brake sets with (section 'lining'), motor overspeed (section
 * 'stopping') and the shaft rating at μ max with the springs at the top of their range ('brake').
 */
export function caliperAtSet(
  v: CaliperInputs,
  duty: CaliperDuty,
  t: CaliperTorques,
  stop: StoppingResult,
  criteria: CriteriaSet,
  d: Derivation,
): CheckResult[] {
  d.section = 'lining';
  const at = dutyAtSet(
    {
      setSpeed: stop.speedAfterDelay,
      speed: duty.brakeSpeed,
      frictionRadius: t.effectiveRadius,
      pressure: q.pressure(t.padPressure),
      brakeTorque: t.wornMin,
    },
    d,
  );
  const vOuter = compute(
    d,
    rubbingSpeedFormula,
    { omega: stop.speedAfterDelay, D: 2 * v.padOuterRadius },
    {
      id: 'rubbing-speed-outer-at-set',
      label: 'Rubbing speed at the pad outer radius when the brake sets',
      symbol: 'v_o,set',
    },
  );
  const checks = [
    makeCheck({
      id: 'rubbing-speed',
      section: 'lining',
      label: 'Rubbing speed at the outer radius when the brake sets ≤ disc rating',
      value: vOuter,
      limit: v.discMaxSpeed,
      kind: 'max',
      dimension: 'speed',
      source: "equipment data (user input): disc maker's speed rating",
    }),
    pvAtSetCheck(at.pv, criteria),
  ];
  checks.push(
    ...overspeedAtSet(
      {
        setSpeed: stop.speedAfterDelay,
        brakeSpeed: duty.brakeSpeed,
        motorRatio: v.ratioToBrake,
        motorMaxSpeed: v.motorMaxSpeed,
        delayAcceleration: duty.driveTorque / v.inertia,
        releaser: 'release unit',
      },
      d,
    ),
  );
  d.section = 'brake';
  const train = driveTrainOverload(
    {
      torqueAtReference: t.max,
      muAtReference: q.ratio(v.muMax),
      springForceAtReference: t.clampForce,
      muMax: q.ratio(v.muMax),
      springForceMax: q.force(v.clampForceMax),
      brakesOnTrain: v.brakeArrangement === 'two' ? 2 : 1,
      driveTrainRating: q.torque(v.maxBrakeTorque),
    },
    d,
  );
  checks.push(
    sheetCheck(
      {
        ...train.check,
        id: 'torque-max-friction',
        source: 'equipment data (user input): shaft and hub torque rating',
      },
      'brake',
      'At μ max with the springs at the top of their range the brake could overload shaft or hub: lower the top of the adjustable range.',
    ),
  );
  return checks;
}
