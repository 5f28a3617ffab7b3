import type { CheckResult, CriteriaSet, FieldSetting, SheetEvaluation } from '../core/types.js';
import type { Derivation } from '../core/step.js';
import { criterion } from '../criteria/lookup.js';
import { releaseAndStroke, type ReleaseResult } from '../release/release.js';
import { settingTable, springLength, type SettingRow } from '../spring-setting/setting-table.js';
import * as q from '../units/quantities.js';
import { makeCheck } from './checks.js';
import type { ShoeInputs } from './shoe-brake-fields.js';
import type { ShoeTorques } from './shoe-brake-torque.js';
import type { ShoeChain } from './shoe-brake-chain.js';
import { RESERVE_STROKE } from '../field/tolerances.js';
import type { FieldTolerance } from '../field/tolerance-types.js';

const REF_STROKE = "stroke budget (common practice; the thruster maker's data governs)";

/** Thruster force and stroke budget (section 'release'). */
export function shoeRelease(
  v: ShoeInputs,
  springForce: number,
  chain: ShoeChain,
  criteria: CriteriaSet,
  d: Derivation,
): { release: ReleaseResult; checks: CheckResult[] } {
  d.section = 'release';
  const rel = releaseAndStroke(
    {
      springForce: q.force(springForce),
      springRate: q.stiffness(v.springRate),
      clearance: q.length(chain.clearance),
      springTravelRatio: q.ratio(v.springTravelRatio),
      thrusterTravelRatio: q.ratio(v.thrusterTravelRatio),
      efficiency: q.ratio(v.releaseEfficiency),
      thrusterForce: q.force(v.thrusterForce),
      nominalStroke: q.length(v.thrusterStroke),
      reserveStroke: q.length(v.reserveStroke),
      wear: q.length(chain.wearAtReadjust),
      minReserveStroke: q.length(v.minReserveStroke),
    },
    d,
    { wearSteps: false },
  );
  const ratioCrit = criterion(criteria, 'thrusterForceRatio');
  return {
    release: rel,
    checks: [
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
      ...(
        [
          ['low-voltage', 'at −10 % supply voltage', v.thrusterFactorLowVoltage],
          ['cold', 'at the lowest site temperature', v.thrusterFactorCold],
          ['hot', 'at the highest site temperature', v.thrusterFactorHot],
        ] as const
      ).map(([id, when, k]) =>
        makeCheck({
          id: `thruster-force-${id}`,
          section: 'release',
          label: `Thruster force ${when} ÷ force needed ≥ required ratio`,
          value: rel.forceRatio * k,
          limit: ratioCrit.value,
          kind: 'min',
          dimension: 'dimensionless',
          source: `${ratioCrit.source}; force factor: thruster maker's data (user input)`,
          failHint: 'The brake may not open fully: choose a stronger thruster.',
        }),
      ),
      // Without a lift stop the rod runs to its end stop: the headroom is zero by construction.
      ...(chain.derivedClearance
        ? []
        : [
            makeCheck({
              id: 'stroke-headroom',
              section: 'release',
              label: 'Thruster stroke left above the released position ≥ 0',
              value: rel.headroom,
              limit: 0,
              kind: 'min',
              dimension: 'length',
              source: REF_STROKE,
              failHint: 'The lift stop is set beyond the thruster stroke: the shoes cannot lift.',
            }),
          ]),
    ],
  };
}

/** Spring length as set, the adjustable-range checks, the setting table and the field settings. */
export function shoeSettings(
  v: ShoeInputs,
  b: ShoeTorques,
  rel: ReleaseResult,
  chain: ShoeChain,
  band: SettingBandLimits,
  d: Derivation,
): {
  checks: CheckResult[];
  table: SheetEvaluation['tables'][number];
  fieldSettings: FieldSetting[];
  warnings: string[];
} {
  const Fs = b.springForce;
  d.section = 'setting';
  const Ls = springLength(q.length(v.springFreeLength), q.force(Fs), q.stiffness(v.springRate), d);
  const range = (id: string, end: 'upper' | 'lower', limit: number, kind: 'max' | 'min') =>
    makeCheck({
      id,
      section: 'setting',
      label: `Spring force within the adjustable range (${end} end)`,
      value: Fs,
      limit,
      kind,
      dimension: 'force',
      source: 'equipment data (user input): adjustable range of the brake spring',
    });
  const lim = permittedBand(v, b, chain, band);
  const warnings: string[] = [];
  let rows: SettingRow[] = [];
  if (lim.high > lim.low) {
    const minPerN = b.min / Fs;
    const loss = v.springRate * v.springTravelRatio * chain.wearAtReadjust;
    const kept = 1 - (v.springRelaxation ?? 0);
    rows = settingTable(
      lim.low,
      lim.high,
      v.springFreeLength,
      v.springRate,
      b.nominal / Fs,
      minPerN,
      11,
    ).map((r) => ({ ...r, torqueMinWorn: Math.max(0, r.springForce * kept - loss) * minPerN }));
  } else {
    warnings.push(
      'No spring setting in the adjustable range gives the required torque at μ min on the worn lining and drum while staying within the drive-train rating at μ max: the setting table is empty.',
    );
  }
  const m = (key: string, label: string, value: number, note?: string): FieldSetting => ({
    key,
    label,
    value,
    unit: 'm',
    dimension: 'length',
    ...(note === undefined ? {} : { note }),
  });
  const derived = 'Derived, not set: check only.';
  // Lining wear uses the reserve up to its minimum between visits. With no lift stop the rod runs
  // to its end stop, so the working stroke and the clearance grow by what the reserve loses.
  // A value the stroke chain derives from the reserve (no lift stop): its tolerance follows from
  // the reserve's, and it grows by what the reserve loses down to its minimum. `perReserve`: how
  // far it moves per unit of reserve stroke (1 for the working stroke, 1/r_t for the clearance).
  const wornBy = v.reserveStroke - v.minReserveStroke;
  const fromReserve = (value: number, perReserve: number, what: string) =>
    chain.derivedClearance
      ? {
          tolerance: throughStrokeChain(perReserve, what),
          inService: {
            kind: 'atMost' as const,
            value: value + wornBy * perReserve,
            label: `the ${what} when the reserve stroke reaches its minimum (re-adjust then)`,
          },
        }
      : {};
  return {
    checks: [
      range('spring-setting-max', 'upper', v.springForceMax, 'max'),
      range('spring-setting-min', 'lower', v.springForceMin, 'min'),
    ],
    table: {
      id: 'spring-setting',
      title: `Spring setting table (new lining) from ${fmtN(lim.low)} to ${fmtN(lim.high)} N`,
      columns: [
        { key: 'springForce', label: 'Spring force', unit: 'N', dimension: 'force' },
        { key: 'springLength', label: 'Spring length', unit: 'm', dimension: 'length' },
        { key: 'torqueNominal', label: 'Torque at μ nominal', unit: 'N m', dimension: 'torque' },
        { key: 'torqueMin', label: 'Torque at μ min', unit: 'N m', dimension: 'torque' },
        {
          key: 'torqueMinWorn',
          label:
            v.springRelaxation === undefined
              ? 'Torque at μ min, worn to re-adjust'
              : 'Torque at μ min, worn to re-adjust, spring relaxed',
          unit: 'N m',
          dimension: 'torque',
        },
      ],
      rows,
    },
    fieldSettings: [
      m('springLength', 'Main spring length as set', Ls, 'Measure with new lining, brake applied.'),
      {
        key: 'springForce',
        label: 'Main spring force as set',
        value: Fs,
        unit: 'N',
        dimension: 'force',
        note: 'Follows from the spring length: set the length, not the force.',
      },
      {
        ...m(
          'shoeClearance',
          'Shoe clearance when released (each side, equal)',
          chain.clearance,
          chain.derivedClearance
            ? 'No lift stop: follows from the stroke and reserve. ' + derived
            : 'Set at the lift stop.',
        ),
        ...fromReserve(chain.clearance, 1 / v.thrusterTravelRatio, 'clearance'),
      },
      {
        ...m('workingStroke', 'Thruster working stroke', rel.workingStroke, derived),
        ...fromReserve(rel.workingStroke, 1, 'working stroke'),
      },
      {
        ...m('reserveStroke', 'Reserve stroke to set (new lining)', v.reserveStroke),
        inService: {
          kind: 'atLeast',
          value: v.minReserveStroke,
          label: 'the minimum reserve stroke (re-adjust below it)',
        },
      },
      m('minReserveStroke', 'Re-adjust before the reserve stroke falls below', v.minReserveStroke),
      m(
        'wearToReadjust',
        'Lining wear per shoe until re-adjustment',
        chain.wearAtReadjust,
        derived,
      ),
      m(
        'wearTorqueLost',
        'Lining wear per shoe at which ALL holding torque is lost (reserve used up)',
        chain.wearReserveUsed,
        derived,
      ),
    ],
    warnings,
  };
}

const fmtN = (n: number) => String(Math.round(n));

/**
 * The tolerance of a value the stroke chain derives from the reserve stroke, with no lift stop:
 * the released rod runs to its end stop, so the working stroke is what the reserve leaves
 * (s_n − s_r) and the clearance that divided by the travel ratio. A reserve set anywhere in its
 * −0 / +3 mm leaves the working stroke 0 to 3 mm short and the clearance 0 to 3/r_t mm small: the
 * card's own ± 10 % stroke and −0.1 / +0.2 mm clearance would let a fitter accept a reserve that
 * breaks its "never less" rule, and judge a clearance out that the reserve's band gives.
 * `perReserve`: how much the value moves per unit of reserve stroke (1, or 1/r_t).
 */
function throughStrokeChain(perReserve: number, what: string): FieldTolerance {
  const r = RESERVE_STROKE.band;
  const [minus, plus] = r.kind === 'absolute' ? [r.plus, r.minus] : [0, 0];
  return {
    band: { kind: 'absolute', minus: minus * perReserve, plus: plus * perReserve },
    source: `${what} follows from the reserve stroke's tolerance through the stroke chain (no lift stop): common practice`,
    confidence: 'common practice',
  };
}

/** What bounds the setting table besides the adjustable range. */
export interface SettingBandLimits {
  /** Torque the duty requires, N·m. */
  required: number;
  brakesOnTrain: number;
  /** Brake torque the drive train can see per newton of spring force (see shoeDriveTrain). */
  trainTorquePerNewton: number;
}

/**
 * The torque band of spring forces (the setting table's rows): from the force that still gives
 * the required torque at μ min at the re-adjustment point on the drum at its wear limit, to the
 * lower of the adjustable range's top and the force at which all brakes on the train at μ max
 * reach its rating, worked out as the drive-train check works it (higher shoe model, no linkage
 * losses). The other checks are not in it: see setting-band.ts.
 */
export function permittedBand(
  v: ShoeInputs,
  b: ShoeTorques,
  chain: ShoeChain,
  band: SettingBandLimits,
): { low: number; high: number } {
  const Fs = b.springForce;
  const loss = v.springRate * v.springTravelRatio * chain.wearAtReadjust;
  const minPerN = ((b.min / Fs) * (v.drumDiameter - v.drumWearAllowance)) / v.drumDiameter;
  // In service the spring keeps (1 − ρ_s) of its set force before wear takes its share.
  const low = Math.max(
    v.springForceMin,
    (band.required / minPerN + loss) / (1 - (v.springRelaxation ?? 0)),
  );
  const high = Math.min(
    v.springForceMax,
    v.maxBrakeTorque / (band.trainTorquePerNewton * Math.max(1, band.brakesOnTrain)),
  );
  return { low, high };
}
