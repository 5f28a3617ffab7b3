import type { FieldCardLayout, SettingBand, SheetEvaluation } from '../core/types.js';
import { settingTolerance, toleranceBounds } from '../field/evaluate-tolerance.js';
import { toleranceText } from '../field/tolerance-text.js';
import { toDisplay, type UnitSystem } from '../units/display.js';
import { settingPrecision } from '../units/precision.js';
import { straightLines } from './setting-band-rows.js';
import { bandEndValue } from './setting-band-words.js';

type Table = SheetEvaluation['tables'][number];

/**
 * The field settings whose card tolerance reaches past the band where every check passes, in
 * words: a fitter who sets the spring length (or force) anywhere inside its tolerance must leave a
 * brake that still passes every check the sheet passes. A setting is read through the table: its
 * own column when the table has one (a spring length is a straight line in spring force), or the
 * table's setting itself. Empty when every tolerance lies inside the band, and for a sheet with
 * checks failing at its set value (the band then says nothing about them).
 */
export function toleranceBeyondBand(
  ev: Pick<SheetEvaluation, 'fieldSettings' | 'checks'>,
  table: Table,
  band: SettingBand,
  card: FieldCardLayout | undefined,
  system: UnitSystem,
): string[] {
  const key = table.columns[0]?.key;
  if (key === undefined || ev.checks.some((c) => !c.pass)) return [];
  const line = straightLines(table, key);
  const out: string[] = [];
  for (const f of ev.fieldSettings) {
    const tolerance = settingTolerance(f, card);
    if (!tolerance) continue;
    const along = f.key === key ? undefined : table.columns.find((c) => c.key === f.key);
    if (f.key !== key && (!along || !line)) continue;
    // The setting as a function of the table's input, and back.
    const first = table.rows[0]!;
    const last = table.rows[table.rows.length - 1]!;
    const slope = along ? (last[f.key]! - first[f.key]!) / (last[key]! - first[key]!) : 1;
    if (!(Number.isFinite(slope) && slope !== 0)) continue;
    const toInput = (s: number) => (along ? first[key]! + (s - first[f.key]!) / slope : s);
    const fromInput = (x: number) => (along ? first[f.key]! + (x - first[key]!) * slope : x);
    // The fitter works from the figure the card prints (a length to the 0.5 mm step), the record
    // from the value itself: the tolerance around either must stay inside the band.
    const ends = [f.value, printedValue(f, system)]
      .flatMap((t) => {
        const { lower, upper } = toleranceBounds(t, tolerance);
        return [lower, upper];
      })
      .filter((s): s is number => s !== null)
      .map(toInput);
    const slack = 1e-9 * Math.abs(band.set);
    const below = ends.filter((x) => x < band.low - slack);
    const above = ends.filter((x) => x > band.high + slack);
    if (below.length === 0 && above.length === 0) continue;
    const force = (x: number) => toDisplay(x, 'force', system).text;
    const own = (s: number) => toDisplay(s, f.dimension, system).text;
    const lo = below.length > 0 ? force(Math.min(...below)) : undefined;
    const hi = above.length > 0 ? force(Math.max(...above)) : undefined;
    const reach = lo && hi ? `${lo} … ${hi}` : lo ? `down to ${lo}` : `up to ${hi}`;
    // The band's ends as the band sentence prints them (rounded inward), in the setting's terms.
    const [a, b] = [
      fromInput(bandEndValue(band.low, 'low', system)),
      fromInput(bandEndValue(band.high, 'high', system)),
    ].sort((p, q) => p - q);
    // The checks that end the band are named by the band sentence printed beside this one.
    const of = along ? `a ${what(table)} ` : '';
    out.push(
      `${f.label} ${toleranceText(tolerance, f.dimension, system)} reaches ${of}${reach}, ` +
        `past the band: keep it between ${own(a!)} and ${own(b!)}.`,
    );
  }
  return out;
}

/** The setting as the card prints it (to the step a fitter sets it by), back in SI. */
function printedValue(f: SheetEvaluation['fieldSettings'][number], system: UnitSystem): number {
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
