import type { CheckResult, CriteriaSet } from '../core/types.js';
import { compute, defineFormula, type Derivation } from '../core/step.js';
import { driveTrainOverload } from '../duty/drive-train-overload.js';
import { pivotDistance, pivotedShoeTorque } from '../shoe-brake/pivoted-shoe.js';
import { shortShoeTorque } from '../shoe-brake/short-shoe.js';
import { travelRatioCheck } from '../shoe-brake/travel-ratio.js';
import { dutyAtSet } from '../stopping/speed-at-set.js';
import type { StoppingResult } from '../stopping/stopping.js';
import * as q from '../units/quantities.js';
import { makeCheck, sheetCheck } from './checks.js';
import { overspeedAtSet, pvAtSetCheck } from './at-set-checks.js';
import type { ShoeInputs } from './shoe-brake-fields.js';
import type { ShoeDuty } from './shoe-brake-evaluate.js';
import type { ShoeLining, ShoeTorques } from './shoe-brake-torque.js';

/**
 * Lining duty at the speed the brake sets with (section 'lining'): while lowering or running
 * downhill the shaft speeds up during the set delay, so rubbing speed and p·v are checked at ω_set,
 * the highest speed of the stop, not at the speed at power off.
 */
export function shoeDutyAtSet(
  v: ShoeInputs,
  duty: ShoeDuty,
  l: ShoeLining,
  stop: StoppingResult,
  criteria: CriteriaSet,
  d: Derivation,
): CheckResult[] {
  d.section = 'lining';
  const at = dutyAtSet(
    {
      setSpeed: stop.speedAfterDelay,
      speed: q.angularSpeed(duty.brakeSpeed),
      frictionRadius: q.length(v.drumDiameter / 2),
      pressure: l.duties.meanPressure,
      brakeTorque: l.wornMin,
    },
    d,
  );
  return [
    makeCheck({
      id: 'rubbing-speed',
      section: 'lining',
      label: 'Rubbing speed when the brake sets ≤ drum rating',
      value: at.rubbingSpeed,
      limit: v.drumMaxSpeed,
      kind: 'max',
      dimension: 'speed',
      source: "equipment data (user input): drum maker's peripheral speed rating",
    }),
    pvAtSetCheck(at.pv, criteria),
  ];
}

/**
 * Motor overspeed at the speed the brake sets with (section 'stopping'), and the longest set
 * delay before the motor reaches its maximum speed when the load keeps driving.
 */
export function shoeOverspeed(duty: ShoeDuty, stop: StoppingResult, d: Derivation): CheckResult[] {
  if (duty.motorMaxSpeed === undefined) return [];
  return overspeedAtSet(
    {
      setSpeed: stop.speedAfterDelay,
      brakeSpeed: duty.brakeSpeed,
      motorRatio: 1,
      motorMaxSpeed: duty.motorMaxSpeed,
      delayAcceleration: duty.driveTorque / duty.inertia,
      releaser: 'thruster',
    },
    d,
  );
}

/**
 * The torque at μ max with the linkage losses taken out: pin friction varies with wear and
 * lubrication and may be far less than η_L allows, so the bound on what the drive train can see
 * credits none of it (η_L = 1).
 */
export const torqueNoLinkageLossFormula = defineFormula({
  id: 'torque-max-no-linkage-loss',
  label: 'Brake torque at μ max with no linkage losses (drive-train bound)',
  symbol: 'M_b,max,η=1',
  expression: 'M / eta',
  symbols: {
    M: { text: 'M_b,max', dimension: 'torque' },
    eta: { text: 'η_L', dimension: 'dimensionless' },
  },
  dimension: 'torque',
  reference:
    'N = F_s·i·η_L (statics); the upper bound takes no pin-friction loss (η_L = 1): common practice',
});

/** The drive-train check and the torque per newton of spring force it is made with. */
export interface ShoeDriveTrain {
  check: CheckResult;
  /**
   * Brake torque at μ max per newton of spring force: the higher of the two shoe models, with no
   * linkage losses. The setting table's top row keeps within the rating with the same figure.
   */
  torquePerNewton: number;
}

/**
 * Drive-train overload (section 'brake') with the worst settings a fitter can reach: μ max and
 * the spring at the top of the adjustable range the setting table offers. The reference torque is
 * the higher of the long-shoe and short-shoe models (the long shoe gives more) with no linkage
 * losses: for this check the larger torque is the conservative one.
 */
export function shoeDriveTrain(
  v: ShoeInputs,
  duty: ShoeDuty,
  b: ShoeTorques,
  d: Derivation,
): ShoeDriveTrain {
  d.section = 'brake';
  const r = q.length(v.drumDiameter / 2);
  const other =
    v.torqueModel === 'pivoted'
      ? shortShoeTorque(q.ratio(b.muMax), b.normalForce, r, d, {
          id: 'torque-max-short-shoe',
          label: 'Brake torque at μ max by the short-shoe model (for comparison)',
          symbol: 'M_b,max,s',
        })
      : pivotedShoeTorque(
          q.ratio(b.muMax),
          b.normalForce,
          pivotDistance(r, q.angle(v.contactAngle / 2), d, { id: 'pivot-distance-long-shoe' }),
          2,
          d,
          {
            id: 'torque-max-long-shoe',
            label: 'Brake torque at μ max by the pivoted long-shoe model (for comparison)',
            symbol: 'M_b,max,l',
          },
        );
  const higher = Math.max(b.max, other);
  const reference = compute(
    d,
    torqueNoLinkageLossFormula,
    { M: higher, eta: v.linkageEfficiency },
    other > b.max
      ? { names: { M: v.torqueModel === 'pivoted' ? 'M_b,max,s' : 'M_b,max,l' } }
      : undefined,
  );
  const res = driveTrainOverload(
    {
      torqueAtReference: reference,
      muAtReference: q.ratio(b.muMax),
      springForceAtReference: b.springForce,
      muMax: q.ratio(b.muMax),
      springForceMax: q.force(v.springForceMax),
      brakesOnTrain: duty.brakesOnTrain ?? 1,
      driveTrainRating: q.torque(v.maxBrakeTorque),
    },
    d,
  );
  return {
    check: sheetCheck(
      { ...res.check, id: 'torque-max-friction' },
      'brake',
      'At μ max with the spring at the top of its range the brake could overload shaft, coupling or gearbox: lower the top of the adjustable range or choose a stronger drive train.',
    ),
    torquePerNewton: reference / b.springForce,
  };
}

/** The spring travel ratio against the lever ratio of the same linkage (section 'lining'). */
export function shoeTravelRatio(v: ShoeInputs, d: Derivation): CheckResult[] {
  d.section = 'lining';
  const r = travelRatioCheck(
    {
      leverRatio: q.ratio(v.leverRatio),
      shoes: 2,
      springTravelRatio: q.ratio(v.springTravelRatio),
    },
    d,
  );
  return r.checks.map((c) =>
    sheetCheck(
      c,
      'lining',
      'Measure the lever arms again: the spring travel ratio and the lever ratio must describe the same linkage.',
    ),
  );
}
