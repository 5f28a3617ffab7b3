import type { FieldCardLayout, FieldSetting, SettingBand, SheetEvaluation } from '../core/types.js';
import { settingTolerance, toleranceBounds } from '../field/evaluate-tolerance.js';
import { toleranceText } from '../field/tolerance-text.js';
import type { FieldTolerance } from '../field/tolerance-types.js';
import { toDisplay, type UnitSystem } from '../units/display.js';
import { settingPrecision } from '../units/precision.js';
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
  band: SettingBand;
  toInput: (s: number) => number;
  /** The band's ends in the setting's terms, lower first. */
  lower: number;
  upper: number;
}

function settingInBand(
  f: FieldSetting,
  table: Table,
  band: SettingBand,
  system: UnitSystem,
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
  const ends = [
    fromInput(bandEndValue(band.low, 'low', system)),
    fromInput(bandEndValue(band.high, 'high', system)),
  ].sort((p, q) => p - q);
  return { table, band, toInput, lower: ends[0]!, upper: ends[1]! };
}

/** Each table with a band, and the settings read through it (checks failing at set: none). */
function* settingsInBands(ev: BandedEvaluation, system: UnitSystem) {
  if (ev.checks.some((c) => !c.pass)) return;
  for (const table of ev.tables) {
    const band = bandOf(ev, table.id);
    if (!band) continue;
    for (const f of ev.fieldSettings) {
      const s = settingInBand(f, table, band, system);
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
  for (const { f, s } of settingsInBands(ev, 'SI')) {
    if (f.key !== setting.key) continue;
    const t = setting.value;
    const { lower, upper } = toleranceBounds(t, base);
    const lo = Math.max(lower!, s.lower);
    const hi = Math.min(upper!, s.upper);
    if (lo === lower && hi === upper) return base;
    if (!(lo <= t && t <= hi)) return base;
    const scale = base.band.kind === 'relative' ? Math.abs(t) : 1;
    return {
      ...base,
      band: { kind: base.band.kind, minus: (t - lo) / scale, plus: (hi - t) / scale },
      source: `${base.source}; ${NARROWED}`,
    };
  }
  return base;
}

/**
 * The field settings whose card tolerance reaches past the band where every check passes, in
 * words for the engineer: the sheet and the editor print them beside the band, and the card and
 * the records use the narrowed tolerance (`bandedTolerance`). The fitter works from the figure the
 * card prints (a length to the 0.5 mm step), the record from the value itself, so the tolerance
 * around either counts. Empty when every tolerance lies inside the band.
 */
export function toleranceBeyondBand(
  ev: BandedEvaluation,
  table: Table,
  card: FieldCardLayout | undefined,
  system: UnitSystem,
): string[] {
  const out: string[] = [];
  for (const { f, s } of settingsInBands(ev, system)) {
    if (s.table !== table) continue;
    const tolerance = settingTolerance(f, card);
    if (!tolerance) continue;
    const ends = [f.value, printedValue(f, system)]
      .flatMap((t) => {
        const { lower, upper } = toleranceBounds(t, tolerance);
        return [lower, upper];
      })
      .filter((v): v is number => v !== null)
      .map(s.toInput);
    const slack = 1e-9 * Math.abs(s.band.set);
    const below = ends.filter((x) => x < s.band.low - slack);
    const above = ends.filter((x) => x > s.band.high + slack);
    if (below.length === 0 && above.length === 0) continue;
    const force = (x: number) => toDisplay(x, 'force', system).text;
    const own = (v: number) => toDisplay(v, f.dimension, system).text;
    const lo = below.length > 0 ? force(Math.min(...below)) : undefined;
    const hi = above.length > 0 ? force(Math.max(...above)) : undefined;
    const reach = lo && hi ? `${lo} … ${hi}` : lo ? `down to ${lo}` : `up to ${hi}`;
    const of = f.key === table.columns[0]?.key ? '' : `a ${what(table)} `;
    const held = bandedTolerance(f, card, ev);
    const range = held ? toleranceBounds(f.value, held) : { lower: null, upper: null };
    const span =
      range.lower !== null && range.upper !== null
        ? ` (${own(range.lower)} to ${own(range.upper)})`
        : '';
    out.push(
      `${f.label} ${toleranceText(tolerance, f.dimension, system)} would reach ${of}${reach}, ` +
        `past the band: the field card and the records hold it to ` +
        `${toleranceText(held, f.dimension, system)}${span}.`,
    );
  }
  return out;
}

/** The setting as the card prints it (to the step a fitter sets it by), back in SI. */
function printedValue(f: FieldSetting, system: UnitSystem): number {
  const d = toDisplay(
    f.value,
    f.dimension,
    system,
    undefined,
    settingPrecision(f.key, f.dimension),
  );
  const shown = Number.parseFloat(d.text);
  return d.value !== 0 && Number.isFinite(shown) ? (shown / d.value) * f.value : f.value;
}

function what(table: Table): string {
  return table.id === 'clamp-setting' ? 'clamp force' : 'spring force';
}
