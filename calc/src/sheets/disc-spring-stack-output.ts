import type { CheckResult, CriteriaSet, FieldSetting, ResultValue } from '../core/types.js';
import { makeCheck } from './checks.js';
import { criterionIfSet } from '../criteria/lookup.js';
import type { StackSetResult } from '../disc-springs/stack-derivation.js';
import type { DiscStack } from '../disc-springs/stack.js';
import { backOffTable, loadDeflectionChart } from './disc-spring-stack-chart.js';
import {
  declaredBackOffTolerance,
  slotNote,
  stackLengthTolerance,
} from './disc-stack-band-checks.js';

/** Default static-load limit for |σOM| at flat when the criteria set has none. */
export const SIGMA_OM_FLAT_DEFAULT = {
  key: 'discSpring.sigmaOMFlatMax',
  value: 1600e6,
  source:
    "from memory: DIN EN 16984 guidance for statically loaded discs, |σOM| at flat ≲ Rm ≈ 1600 N/mm² for spring steel — check the governing standard and the maker's data",
};

export interface StackOutputInput {
  key: 'a' | 'b';
  section: string;
  title: string;
  stack: DiscStack;
  lead: number;
  angle: number;
  /** Back-off tolerance, rad, one-sided: the fitter turns further to lock, never back. */
  tolerance: number;
  required: number;
  r: StackSetResult;
  /** The stack at θ − Δθ (short, nearer flat) and θ + Δθ (past): the ends the sheet checks. */
  short: StackSetResult;
  past: StackSetResult;
}

/** Results, chart, field settings, table and warnings of one stack (its checks: stackChecks). */
export function stackOutputs(x: StackOutputInput) {
  const { key, section, r, stack } = x;
  const res = (
    k: string,
    label: string,
    symbol: string,
    value: number,
    unit: string,
    dimension: ResultValue['dimension'],
  ): ResultValue => ({
    key: `${key}.${k}`,
    section,
    label,
    symbol,
    value,
    unit,
    dimension,
  });
  const results: ResultValue[] = [
    res('release', 'Axial release of the back-off', 'Δ', r.release, 'm', 'length'),
    res('setDeflection', 'Deflection per set', 's', r.setDeflection, 'm', 'length'),
    res('setRatio', 'Deflection as a fraction of h0', 's/h₀', r.setRatio, '', 'dimensionless'),
    res(
      'preload',
      'Preload after back-off (unloading, with friction)',
      'F_V',
      r.stackUnloading,
      'N',
      'force',
    ),
    res('forceNominal', 'Stack force without friction', 'F_ges', r.stackNominal, 'N', 'force'),
    res(
      'forceLoading',
      'Stack force when loading past the set point',
      'F_R,load',
      r.stackLoading,
      'N',
      'force',
    ),
    res('flatForce', 'Flat load of one disc', 'F_c', r.flatForce, 'N', 'force'),
    res(
      'flatStackForce',
      'Stack force at flat while tightening',
      'F_c,load',
      r.flatStackLoading,
      'N',
      'force',
    ),
    res('sigmaOM', 'Stress σOM at the set point', 'σ_OM', r.stresses.OM, 'Pa', 'pressure'),
    res('sigmaI', 'Stress σI at the set point', 'σ_I', r.stresses.I, 'Pa', 'pressure'),
    res('sigmaII', 'Stress σII at the set point', 'σ_II', r.stresses.II, 'Pa', 'pressure'),
    res('sigmaIII', 'Stress σIII at the set point', 'σ_III', r.stresses.III, 'Pa', 'pressure'),
    res('sigmaIV', 'Stress σIV at the set point', 'σ_IV', r.stresses.IV, 'Pa', 'pressure'),
    res('sigmaOMFlat', 'Stress σOM at flat', 'σ_OM,c', r.sigmaOMFlat, 'Pa', 'pressure'),
    res('freeLength', 'Free length of the stack', 'L₀', r.freeLength, 'm', 'length'),
    res('flatLength', 'Flat (solid) length of the stack', 'L_c', r.flatLength, 'm', 'length'),
    res('setLength', 'Stack length at the set point', 'L₁', r.setLength, 'm', 'length'),
  ];
  if (r.angleForRequired !== undefined) {
    results.push(
      res(
        'angleForRequired',
        'Largest back-off that still gives the required preload',
        'θ_req',
        r.angleForRequired,
        'rad',
        'angle',
      ),
    );
  }

  const chart = loadDeflectionChart(x);

  const fieldSettings: FieldSetting[] = [
    {
      key: `${key}.backOffAngle`,
      label: `${x.title}: back-off angle from flat`,
      value: x.angle,
      unit: 'rad',
      dimension: 'angle',
      note: `Tighten until every disc is flat, back off this angle, then lock (split pin or lock plate). ${slotNote(x.tolerance)}`,
      tolerance: declaredBackOffTolerance(x.tolerance),
    },
    {
      key: `${key}.preload`,
      label: `${x.title}: resulting preload`,
      value: r.stackUnloading,
      unit: 'N',
      dimension: 'force',
    },
    {
      key: `${key}.setLength`,
      label: `${x.title}: stack length when set`,
      value: r.setLength,
      unit: 'm',
      dimension: 'length',
      tolerance: stackLengthTolerance(r.setLength, x.short.setLength, x.past.setLength),
      note: 'Measure to confirm the setting.',
    },
  ];
  if (r.angleForRequired !== undefined) {
    fieldSettings.push({
      key: `${key}.angleForRequired`,
      label: `${x.title}: back off no further than`,
      value: r.angleForRequired,
      unit: 'rad',
      dimension: 'angle',
      // A fitter reads a card row as a value to set: this one is a limit on the back-off above.
      note: 'A limit, not the setting: backing off further leaves less than the required preload.',
    });
  }

  const table = backOffTable(x);

  const warnings: string[] = [];
  const prefix = `${x.title}: `;
  // Outside the working band the set-deflection checks fail and say so; slack says more.
  if (r.slack)
    warnings.push(
      prefix + 'the back-off exceeds the travel to flat; the stack is loose and gives no preload.',
    );
  const ht = (r.constants.K4 * r.h0) / r.constants.tCalc;
  if (ht > Math.SQRT2)
    warnings.push(
      prefix +
        `K4·h0/t = ${ht.toFixed(2)} exceeds √2: the force falls before flat (regressive curve); the flat datum and back-off behave differently (DIN EN 16984).`,
    );
  if (r.constants.group === 3 && stack.disc.tReduced === undefined)
    warnings.push(
      prefix +
        'thickness above 6 mm is group 3: enter the reduced thickness t′ of discs with contact flats.',
    );
  if (r.freeLength > 3 * stack.disc.De)
    warnings.push(
      prefix +
        'free length exceeds about 3·De: guide the stack well; friction and uneven deflection grow (maker guidance, from memory).',
    );
  if (stack.parallelCount > 3)
    warnings.push(
      prefix +
        'more than three discs in parallel: friction makes the force uncertain (maker guidance, from memory).',
    );
  return { results, chart, fieldSettings, table, warnings };
}

/**
 * |σOM| at flat against the static-load limit (the check for statically loaded discs, in place of
 * the fatigue band): the criteria value if the set carries one, else the from-memory default.
 */
export function sigmaOMFlatCheck(
  key: string,
  section: string,
  sigmaOMFlat: number,
  criteria: CriteriaSet,
  label = 'Stress |σOM| at flat (static load)',
): CheckResult {
  const crit = criterionIfSet(criteria, SIGMA_OM_FLAT_DEFAULT.key);
  return makeCheck({
    id: `${key}-sigma-om-flat`,
    section,
    label,
    value: Math.abs(sigmaOMFlat),
    limit: crit ? crit.value : SIGMA_OM_FLAT_DEFAULT.value,
    dimension: 'pressure',
    kind: 'max',
    source: crit ? crit.source : SIGMA_OM_FLAT_DEFAULT.source,
    failHint: 'The disc is overstressed when pressed flat: choose a thicker or larger disc.',
  });
}
