import type { ChartData, CheckResult, FieldError } from '../core/types.js';
import { compute, type Derivation } from '../core/step.js';
import {
  liningWearAllowanceFormula,
  REF_DRUM,
  torqueDrumLimitFormula,
} from '../shoe-brake/wear-limits.js';
import { strokeWearChain, torqueWearPoints } from '../release/stroke-wear.js';
import * as q from '../units/quantities.js';
import { TORQUE_WEAR_AXES } from './charts.js';
import { makeCheck } from './checks.js';
import type { ShoeInputs } from './shoe-brake-fields.js';
import type { ShoeTorques } from './shoe-brake-torque.js';

/** The stroke–wear–setting chain of the shoe brake, as the sheet uses it (section 'release'). */
export interface ShoeChain {
  /** Shoe clearance when released: set with a lift stop, else derived from the stroke. */
  clearance: number;
  derivedClearance: boolean;
  /** Wear per shoe at the re-adjustment point (the worn case of the sheet). */
  wearAtReadjust: number;
  /** Wear per shoe at which the reserve is used up and the holding torque falls to zero. */
  wearReserveUsed: number;
  /** Torque at μ min against wear per shoe (zero once the reserve is used up). */
  torqueMinAtWear(w: number): number;
  checks: CheckResult[];
}

/** Cross-field rules of the chain inputs. */
export function validateChainInputs(v: ShoeInputs): FieldError[] {
  const e: FieldError[] = [];
  if (!(v.reserveStroke <= v.thrusterStroke))
    e.push({ field: 'reserveStroke', message: 'must not exceed the thruster stroke' });
  if (!(v.reserveStroke > v.minReserveStroke))
    e.push({ field: 'reserveStroke', message: 'must exceed the minimum reserve stroke' });
  if (!v.liftStop && !(v.reserveStroke < v.thrusterStroke))
    e.push({ field: 'reserveStroke', message: 'leaves no stroke to lift the shoes' });
  if (v.liftStop && !(v.clearance > 0))
    e.push({ field: 'clearance', message: 'set the clearance when the thruster has a lift stop' });
  if (!(v.liningMinThickness < v.liningThickness))
    e.push({ field: 'liningMinThickness', message: 'must be below the new lining thickness' });
  if (!(v.drumWearAllowance < 0.5 * v.drumDiameter))
    e.push({ field: 'drumWearAllowance', message: 'must be less than half the drum diameter' });
  const wAdj = (v.reserveStroke - v.minReserveStroke) / v.thrusterTravelRatio;
  if (!(v.springForce - v.springRate * v.springTravelRatio * wAdj > 0))
    e.push({
      field: 'reserveStroke',
      message: 'the spring goes slack before the re-adjustment point: set a smaller reserve',
    });
  return e;
}

/**
 * The fitter sets the reserve stroke (and the clearance only when the thruster has a lift stop);
 * the clearance without a lift stop, the re-adjustment point and the wear at which the torque is
 * lost follow (strokeWearChain). The sheet's worn case is the re-adjustment point.
 */
export function shoeChain(v: ShoeInputs, b: ShoeTorques, d: Derivation): ShoeChain {
  d.section = 'release';
  const chain = strokeWearChain(
    {
      nominalStroke: q.length(v.thrusterStroke),
      reserveStroke: q.length(v.reserveStroke),
      minReserveStroke: q.length(v.minReserveStroke),
      thrusterTravelRatio: q.ratio(v.thrusterTravelRatio),
      springForce: b.springForce,
      springRate: q.stiffness(v.springRate),
      springTravelRatio: q.ratio(v.springTravelRatio),
      torqueNew: b.min,
      relaxation: v.springRelaxation === undefined ? undefined : q.ratio(v.springRelaxation),
    },
    d,
    { torqueStep: false },
  );
  const checks = chain.checks.map((c) =>
    makeCheck({
      ...c,
      section: 'release',
      failHint: 'Set a larger reserve stroke (it must stay above the minimum until re-adjusted).',
    }),
  );
  return {
    clearance: v.liftStop ? v.clearance : chain.clearance,
    derivedClearance: !v.liftStop,
    wearAtReadjust: chain.wearAtReadjust,
    wearReserveUsed: chain.wearReserveUsed,
    torqueMinAtWear: chain.torqueAtWear,
    checks,
  };
}

/**
 * Lining at its minimum thickness with the drum at its wear limit: the re-adjustment point at
 * μ min on the smallest drum is the lowest torque the brake gives in service (section 'lining').
 */
export function shoeWearLimits(
  v: ShoeInputs,
  wornMin: number,
  wearAtReadjust: number,
  required: { value: number; source: string },
  d: Derivation,
): { lowestTorque: q.Torque; checks: CheckResult[]; warnings: string[] } {
  d.section = 'lining';
  const wL = compute(d, liningWearAllowanceFormula, {
    t: v.liningThickness,
    t_min: v.liningMinThickness,
  });
  const M = compute(d, torqueDrumLimitFormula, {
    M_w: wornMin,
    D: v.drumDiameter,
    dD: v.drumWearAllowance,
  });
  const adjustments = wearAtReadjust > 0 ? Math.floor(wL / wearAtReadjust) : 0;
  return {
    lowestTorque: M,
    checks: [
      makeCheck({
        id: 'torque-drum-wear-limit',
        section: 'lining',
        label:
          'Brake torque at μ min, re-adjustment point, lining at minimum and drum at its wear limit ≥ required',
        value: M,
        limit: required.value,
        kind: 'min',
        dimension: 'torque',
        source: `${required.source}; ${REF_DRUM}`,
        failHint: 'Raise the spring setting, or re-machine or replace the drum earlier.',
      }),
      makeCheck({
        id: 'lining-wear-allowance',
        section: 'lining',
        label: 'Lining wear to minimum thickness ≥ wear to the re-adjustment point',
        value: wL,
        limit: wearAtReadjust,
        kind: 'min',
        dimension: 'length',
        source: "lining maker's minimum thickness (equipment data); stroke chain (common practice)",
        failHint: 'The lining reaches its minimum thickness before the first re-adjustment.',
      }),
    ],
    warnings: [
      `Lining at minimum thickness: about ${adjustments} re-adjustment(s) of the reserve stroke before the lining is replaced; replace the linings (both shoes) at the minimum thickness and the drum at its wear-limit diameter (maker's data).`,
    ],
  };
}

/**
 * Torque against wear per shoe at μ nominal and μ min from the chain: the spring's fall, then the
 * vertical drop to zero where the reserve is used up; the re-adjustment point is marked.
 */
export function chainWearChart(
  chain: ShoeChain,
  nominalPerMin: number,
  required: number,
): ChartData {
  const maxWear = chain.wearReserveUsed * 1.25;
  const min = torqueWearPoints(
    { torqueAtWear: chain.torqueMinAtWear, wearReserveUsed: q.length(chain.wearReserveUsed) },
    maxWear,
  );
  return {
    ...TORQUE_WEAR_AXES,
    series: [
      { name: 'μ nominal', points: min.map((p) => ({ x: p.x, y: p.y * nominalPerMin })) },
      { name: 'μ min', points: min },
    ],
    referenceLines: [
      { label: 'Required torque', axis: 'y', value: required },
      { label: 'Re-adjust', axis: 'x', value: chain.wearAtReadjust },
      { label: 'Reserve used up: torque lost', axis: 'x', value: chain.wearReserveUsed },
    ],
  };
}
