import type { CheckResult, CriteriaSet, FieldSetting, SheetEvaluation } from '../core/types.js';
import type { Derivation } from '../core/step.js';
import { criterion } from '../criteria/lookup.js';
import { releaseAndStroke, type ReleaseResult } from '../release/release.js';
import { settingTable, springLength } from '../spring-setting/setting-table.js';
import * as q from '../units/quantities.js';
import { makeCheck } from './checks.js';
import type { ShoeInputs } from './shoe-brake-fields.js';
import type { ShoeTorques } from './shoe-brake-torque.js';

const REF_STROKE = "stroke budget (common practice; the thruster maker's data governs)";

/** Thruster force and stroke budget (section 'release'). */
export function shoeRelease(
  v: ShoeInputs,
  springForce: number,
  criteria: CriteriaSet,
  d: Derivation,
): { release: ReleaseResult; checks: CheckResult[] } {
  d.section = 'release';
  const rel = releaseAndStroke(
    {
      springForce: q.force(springForce),
      springRate: q.stiffness(v.springRate),
      clearance: q.length(v.clearance),
      springTravelRatio: q.ratio(v.springTravelRatio),
      thrusterTravelRatio: q.ratio(v.thrusterTravelRatio),
      efficiency: q.ratio(v.releaseEfficiency),
      thrusterForce: q.force(v.thrusterForce),
      nominalStroke: q.length(v.thrusterStroke),
      reserveStroke: q.length(v.reserveStroke),
      wear: q.length(v.wear),
      minReserveStroke: q.length(v.minReserveStroke),
    },
    d,
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
      makeCheck({
        id: 'reserve-stroke-worn',
        section: 'release',
        label: 'Reserve stroke at fully worn lining ≥ minimum',
        value: rel.wornReserveStroke,
        limit: v.minReserveStroke,
        kind: 'min',
        dimension: 'length',
        source: "equipment data (user input): thruster maker's minimum reserve stroke",
        failHint:
          'With the reserve stroke used up the brake can lose all holding torque: re-adjust earlier or set a larger reserve.',
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
    ],
  };
}

/** Spring length as set, the adjustable-range checks, the setting table and the field settings. */
export function shoeSettings(
  v: ShoeInputs,
  b: ShoeTorques,
  rel: ReleaseResult,
  d: Derivation,
): {
  checks: CheckResult[];
  table: SheetEvaluation['tables'][number];
  fieldSettings: FieldSetting[];
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
  const rows = settingTable(
    v.springForceMin,
    v.springForceMax,
    v.springFreeLength,
    v.springRate,
    b.nominal / Fs,
    b.min / Fs,
    11,
  );
  const m = (key: string, label: string, value: number, note?: string): FieldSetting => ({
    key,
    label,
    value,
    unit: 'm',
    dimension: 'length',
    ...(note === undefined ? {} : { note }),
  });
  return {
    checks: [
      range('spring-setting-max', 'upper', v.springForceMax, 'max'),
      range('spring-setting-min', 'lower', v.springForceMin, 'min'),
    ],
    table: {
      id: 'spring-setting',
      title: 'Spring setting table (new lining)',
      columns: [
        { key: 'springForce', label: 'Spring force', unit: 'N', dimension: 'force' },
        { key: 'springLength', label: 'Spring length', unit: 'm', dimension: 'length' },
        { key: 'torqueNominal', label: 'Torque at μ nominal', unit: 'N m', dimension: 'torque' },
        { key: 'torqueMin', label: 'Torque at μ min', unit: 'N m', dimension: 'torque' },
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
      },
      m('shoeClearance', 'Shoe clearance when released (each side, equal)', v.clearance),
      m('workingStroke', 'Thruster working stroke', rel.workingStroke),
      m('reserveStroke', 'Reserve stroke to set (new lining)', v.reserveStroke),
      m('minReserveStroke', 'Re-adjust before the reserve stroke falls below', v.minReserveStroke),
      m('wearToReadjust', 'Lining wear per shoe until re-adjustment', rel.wearToReadjust),
    ],
  };
}
