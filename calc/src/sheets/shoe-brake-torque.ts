import type { CheckResult } from '../core/types.js';
import type { Derivation } from '../core/step.js';
import type { LiningMaterial } from '../criteria/linings.js';
import { shoeNormalForce } from '../shoe-brake/shoe-force.js';
import { shortShoeTorque } from '../shoe-brake/short-shoe.js';
import {
  pivotDistance,
  pivotedPeakPressure,
  pivotedShoeTorque,
} from '../shoe-brake/pivoted-shoe.js';
import { wornSpringForce } from '../shoe-brake/worn-lining.js';
import { liningDuty, type LiningDutyResult } from '../shoe-brake/lining-duty.js';
import * as q from '../units/quantities.js';
import { makeCheck } from './checks.js';
import type { ShoeInputs } from './shoe-brake-fields.js';
import type { ShoeDuty } from './shoe-brake-evaluate.js';

/** Torque of the new brake over the friction band (section 'brake'). */
export interface ShoeTorques {
  springForce: q.Force;
  normalForce: q.Force;
  muMin: number;
  muNominal: number;
  muMax: number;
  nominal: q.Torque;
  min: q.Torque;
  max: q.Torque;
  /** Torque of both shoes at a friction coefficient and a normal force, recorded as a step. */
  /** `names`: symbols printed by another name in this step (N as N_w at worn lining). */
  torqueAt(
    mu: number,
    n: number,
    id: string,
    label: string,
    symbol: string,
    names?: Record<string, string>,
  ): q.Torque;
}

/** Torque and pressure at worn lining and the lining's duty (section 'lining'). */
export interface ShoeLining {
  wornSpringForce: q.Force;
  wornMin: q.Torque;
  wornNominal: q.Torque;
  peakPressure: q.Pressure;
  duties: LiningDutyResult;
}

/** Shoe normal force and brake torque at μ min, nominal and max with new lining. */
export function shoeTorques(v: ShoeInputs, d: Derivation): ShoeTorques {
  const r = v.drumDiameter / 2;
  const Fs = q.force(v.springForce);
  const pivoted = v.torqueModel === 'pivoted';
  d.section = 'brake';
  const N = shoeNormalForce(Fs, q.ratio(v.leverRatio), q.ratio(v.linkageEfficiency), d);
  const arm = pivoted ? pivotDistance(q.length(r), q.angle(v.contactAngle / 2), d) : q.length(r);
  const torqueAt = (
    mu: number,
    n: number,
    id: string,
    label: string,
    symbol: string,
    names?: Record<string, string>,
  ) =>
    pivoted
      ? pivotedShoeTorque(q.ratio(mu), q.force(n), arm, 2, d, { id, label, symbol, names })
      : shortShoeTorque(q.ratio(mu), q.force(n), q.length(r), d, { id, label, symbol, names });
  const nominal = torqueAt(
    v.muNominal,
    N,
    'torque-nominal',
    'Brake torque at μ nominal, new lining',
    'M_b,nom',
  );
  const min = torqueAt(v.muMin, N, 'torque-min', 'Brake torque at μ min, new lining', 'M_b,min');
  const max = torqueAt(v.muMax, N, 'torque-max', 'Brake torque at μ max, new lining', 'M_b,max');
  return {
    springForce: Fs,
    normalForce: N,
    muMin: v.muMin,
    muNominal: v.muNominal,
    muMax: v.muMax,
    nominal,
    min,
    max,
    torqueAt,
  };
}

/**
 * Spring force and torque at the re-adjustment point (the worn case: wear `wear` per shoe), peak
 * and mean pressure, rubbing speed and p·v.
 */
export function shoeLining(
  v: ShoeInputs,
  duty: ShoeDuty,
  b: ShoeTorques,
  wear: number,
  d: Derivation,
): ShoeLining {
  const r = v.drumDiameter / 2;
  d.section = 'lining';
  const worn = wornSpringForce(
    b.springForce,
    q.stiffness(v.springRate),
    q.length(wear),
    q.ratio(v.springTravelRatio),
    d,
    {
      point: { words: 'at the re-adjustment point', wearSymbol: 'w_adj' },
      relaxation: v.springRelaxation === undefined ? undefined : q.ratio(v.springRelaxation),
    },
  );
  const Nw = shoeNormalForce(worn.force, q.ratio(v.leverRatio), q.ratio(v.linkageEfficiency), d, {
    id: 'shoe-normal-force-worn',
    label: 'Normal force on each shoe at the re-adjustment point',
    symbol: 'N_w',
    names: { F_s: 'F_s,w' },
  });
  const wornMin = b.torqueAt(
    b.muMin,
    Nw,
    'torque-worn-min',
    'Brake torque at μ min, lining worn to the re-adjustment point',
    'M_b,w,min',
    { N: 'N_w' },
  );
  const wornNominal = b.torqueAt(
    b.muNominal,
    Nw,
    'torque-worn-nominal',
    'Brake torque at μ nominal, lining worn to the re-adjustment point',
    'M_b,w,nom',
    { N: 'N_w' },
  );
  const peakPressure = pivotedPeakPressure(
    b.normalForce,
    q.length(v.shoeWidth),
    q.length(r),
    q.angle(v.contactAngle / 2),
    d,
    { label: 'Peak lining pressure (cos θ distribution)' },
  );
  const duties = liningDuty(
    {
      normalForce: b.normalForce,
      width: q.length(v.shoeWidth),
      drumDiameter: q.length(v.drumDiameter),
      contactAngle: q.angle(v.contactAngle),
      brakeSpeed: q.angularSpeed(duty.brakeSpeed),
    },
    d,
  );
  return { wornSpringForce: worn.force, wornMin, wornNominal, peakPressure, duties };
}

/** Torque against the requirement and the lining pressures (speed, p·v and the drive train: shoe-brake-at-set.ts). */
export function shoeTorqueChecks(
  v: ShoeInputs,
  duty: ShoeDuty,
  b: ShoeTorques,
  l: ShoeLining,
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
      failHint: 'Raise the spring setting or the lever ratio, or choose a larger brake.',
    });
  return [
    tq('torque-nominal', 'Brake torque at μ nominal ≥ required', b.nominal),
    tq('torque-min-friction', 'Brake torque at μ min ≥ required', b.min),
    tq(
      'torque-worn-min-friction',
      'Brake torque at μ min, lining worn to the re-adjustment point ≥ required',
      l.wornMin,
    ),
    makeCheck({
      id: 'lining-peak-pressure',
      section: 'lining',
      label: 'Peak lining pressure ≤ lining maximum',
      value: l.peakPressure,
      limit: lining.maxPressure,
      kind: 'max',
      dimension: 'pressure',
      source: `${lining.source} (${lining.label})`,
    }),
    makeCheck({
      id: 'lining-mean-pressure',
      section: 'lining',
      label: 'Mean lining pressure ≤ upper working pressure',
      value: l.duties.meanPressure,
      limit: lining.workingPressureMax,
      kind: 'max',
      dimension: 'pressure',
      source: `${lining.source} (${lining.label})`,
    }),
  ];
}
