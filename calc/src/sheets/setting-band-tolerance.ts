import type {
  Dimension,
  FieldCardLayout,
  FieldSetting,
  SettingBand,
  SheetEvaluation,
} from '../core/types.js';
import { settingTolerance, toleranceBounds } from '../field/evaluate-tolerance.js';
import { toleranceText } from '../field/tolerance-text.js';
import type { FieldTolerance } from '../field/tolerance-types.js';
import { toDisplay, type UnitSystem } from '../units/display.js';
import { straightLines } from './setting-band-rows.js';
import { bandEndValue, bandOf } from './setting-band-words.js';

type Table = SheetEvaluation['tables'][number];
type BandedEvaluation = Pick<
  SheetEvaluation,
  'fieldSettings' | 'checks' | 'tables' | 'settingBands'
>;

/** Added to a tolerance's source when the sheet's band narrowed it. */
const NARROWED = 'narrowed to the band where every check of this sheet passes';

/**
 * A field setting read through a setting table: the table's own setting (a spring or clamp
 * force), or a column that is a straight line in it (a spring length), with the band's ends
 * (rounded inward, as the band sentence prints them) in the setting's own terms.
 */
interface SettingInBand {
  table: Table;
  toInput: (s: number) => number;
  /** The band's ends in the setting's terms, lower first. */
  lower: number;
  upper: number;
}

function settingInBand(
  f: FieldSetting,
  table: Table,
  band: SettingBand,
): SettingInBand | undefined {
  const key = table.columns[0]?.key;
  if (key === undefined || table.rows.length < 2) return undefined;
  const along = f.key === key ? undefined : table.columns.find((c) => c.key === f.key);
  if (f.key !== key && (!along || !straightLines(table, key))) return undefined;
  const first = table.rows[0]!;
  const last = table.rows[table.rows.length - 1]!;
  const slope = along ? (last[f.key]! - first[f.key]!) / (last[key]! - first[key]!) : 1;
  if (!(Number.isFinite(slope) && slope !== 0)) return undefined;
  const toInput = (s: number) => (along ? first[key]! + (s - first[f.key]!) / slope : s);
  const fromInput = (x: number) => (along ? first[f.key]! + (x - first[key]!) * slope : x);
  // The ends as the SI band sentence prints them, so the held tolerance does not hang on the
  // unit system a card is printed in.
  const ends = [
    fromInput(bandEndValue(band.low, 'low', 'SI')),
    fromInput(bandEndValue(band.high, 'high', 'SI')),
  ].sort((p, q) => p - q);
  return { table, toInput, lower: ends[0]!, upper: ends[1]! };
}

/** Each table with a band, and the settings read through it (checks failing at set: none). */
function* settingsInBands(ev: BandedEvaluation) {
  if (ev.checks.some((c) => !c.pass)) return;
  for (const table of ev.tables) {
    const band = bandOf(ev, table.id);
    if (!band) continue;
    for (const f of ev.fieldSettings) {
      const s = settingInBand(f, table, band);
      if (s) yield { f, s };
    }
  }
}

/**
 * A setting's tolerance held inside the band where every check passes. A fitter who sets the
 * spring length (or force) anywhere inside the tolerance must leave a brake that passes every
 * check the sheet passes, so where the card's tolerance reaches past the band, the side that does
 * is cut back to the band's end and the source says so. The field card prints this tolerance and
 * field records are judged against it. Unchanged where the band holds the whole tolerance, for a
 * setting the tables do not carry, and for a sheet with checks failing at its set value.
 */
export function bandedTolerance(
  setting: FieldSetting,
  card: FieldCardLayout | undefined,
  ev: BandedEvaluation,
): FieldTolerance | null {
  const base = settingTolerance(setting, card);
  if (!base || (base.band.kind !== 'absolute' && base.band.kind !== 'relative')) return base;
  for (const { f, s } of settingsInBands(ev)) {
    if (f.key !== setting.key) continue;
    const t = setting.value;
    const { lower, upper } = toleranceBounds(t, base);
    const lo = Math.max(lower!, s.lower);
    const hi = Math.min(upper!, s.upper);
    if (lo === lower && hi === upper) return base;
    if (!(lo <= t && t <= hi)) return base;
    // In the setting's own unit: the band's ends are round figures (1120 N, 1170 N), a share of
    // the target is not (−2.61 %), and a fitter reads newtons or millimetres.
    return {
      ...base,
      band: { kind: 'absolute', minus: t - lo, plus: hi - t },
      source: `${base.source}; ${NARROWED}`,
    };
  }
  return base;
}

/**
 * The field settings whose card tolerance `bandedTolerance` held inside the band, in words for the
 * engineer: the sheet and the editor print them beside the band, the card and the records use the
 * held tolerance. Empty when every tolerance lies inside the band.
 */
export function toleranceBeyondBand(
  ev: BandedEvaluation,
  table: Table,
  card: FieldCardLayout | undefined,
  system: UnitSystem,
): string[] {
  const out: string[] = [];
  for (const { f, s } of settingsInBands(ev)) {
    if (s.table !== table) continue;
    const declared = settingTolerance(f, card);
    const held = bandedTolerance(f, card, ev);
    if (!declared || !held || held === declared) continue;
    // Lower end first: a longer spring length is a lower spring force.
    const span = (t: FieldTolerance, map: (v: number) => number, dimension: Dimension) => {
      const { lower, upper } = toleranceBounds(f.value, t);
      const [a, b] = [map(lower!), map(upper!)].sort((p, q) => p - q);
      const show = (v: number) => toDisplay(v, dimension, system).text;
      return `${show(a!)} … ${show(b!)}`;
    };
    const of = f.key === table.columns[0]?.key ? '' : `a ${what(table)} of `;
    out.push(
      `${f.label} ${toleranceText(declared, f.dimension, system, f.key)} would span ${of}` +
        `${span(declared, s.toInput, 'force')}, past the band: the field card and the records hold it to ` +
        `${toleranceText(held, f.dimension, system, f.key)} (${span(held, (v) => v, f.dimension)}).`,
    );
  }
  return out;
}

function what(table: Table): string {
  return table.id === 'clamp-setting' ? 'clamp force' : 'spring force';
}
