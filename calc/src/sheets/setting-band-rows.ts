import type { SheetEvaluation } from '../core/types.js';
import type { UnitSystem } from '../units/display.js';
import { bandEndValue, bandOf, rowVerdict } from './setting-band-words.js';

type Table = SheetEvaluation['tables'][number];

/** A point of the band a row stands for. */
export type BandMark = 'low end' | 'as set' | 'high end';

export interface SettingTableRow {
  values: Readonly<Record<string, number>>;
  /** Labels of the checks failing at this setting; undefined where the record carries no band. */
  failing: readonly string[] | undefined;
  /** The band's ends and the set value, where this row stands for them. */
  marks: BandMark[];
}

/** A table with this many passing rows shows the band well enough on its own. */
const MIN_PASSING_ROWS = 2;

/** How far a column may stray from a straight line through the first and last rows. */
const LINEAR_TOLERANCE = 1e-9;

/**
 * A setting table's rows, each with the checks that fail at its setting when the record carries
 * the table's band, and the band put in where the table's equal steps miss it (fewer than two of
 * its rows pass every check): the band's low end and high end (as the band sentence prints them,
 * rounded inward) and the set value, each as a row of its own marked for what it is, so a fitter
 * never reads a table of settings that all fail beside a set value that passes. Where the rows
 * show the band, the set value alone is put in, so the card always has the row it is set to. The rows are read
 * off the table's straight lines (every column of a setting table is linear in the setting: torque
 * and length in spring force). Nothing is added where a column is not linear, where a check
 * already fails at the set value, or where a point lies outside the table.
 */
export function settingTableRows(
  ev: Pick<SheetEvaluation, 'checks' | 'settingBands'>,
  table: Table,
  system: UnitSystem,
): SettingTableRow[] {
  const band = bandOf(ev, table.id);
  const rows: SettingTableRow[] = table.rows.map((values, k) => ({
    values,
    failing: band?.failing[k],
    marks: [],
  }));
  const key = table.columns[0]?.key;
  const failsAtSet = ev.checks.some((c) => !c.pass);
  if (!band || failsAtSet || rows.length < 2 || key === undefined) return rows;
  const line = straightLines(table, key);
  if (!line) return rows;
  // With the band shown by the table's own rows, the set value alone is put in (a fitter looks
  // for the row of the setting on the card); else the band's ends too.
  const shown = rows.filter((r) => r.failing?.length === 0).length >= MIN_PASSING_ROWS;
  const points: { x: number; mark: BandMark }[] = shown
    ? [{ x: band.set, mark: 'as set' }]
    : [
        { x: bandEndValue(band.low, 'low', system), mark: 'low end' },
        { x: band.set, mark: 'as set' },
        { x: bandEndValue(band.high, 'high', system), mark: 'high end' },
      ];
  for (const { x, mark } of points) {
    if ((mark === 'low end' && x > band.set) || (mark === 'high end' && x < band.set)) continue;
    if (!(x >= line.x0 * (1 - LINEAR_TOLERANCE) && x <= line.x1 * (1 + LINEAR_TOLERANCE))) continue;
    const same = rows.find((r) => Math.abs(r.values[key]! - x) <= LINEAR_TOLERANCE * x);
    if (same) {
      same.marks.push(mark);
      continue;
    }
    const at = rows.findIndex((r) => r.values[key]! > x);
    rows.splice(at < 0 ? rows.length : at, 0, { values: line.at(x), failing: [], marks: [mark] });
  }
  return rows;
}

/**
 * Each column as a straight line in the setting column `key` through the first and last rows,
 * if every row lies on it and the setting rises row by row; otherwise undefined.
 */
export function straightLines(table: Table, key: string) {
  const first = table.rows[0]!;
  const last = table.rows[table.rows.length - 1]!;
  const x0 = first[key]!;
  const x1 = last[key]!;
  if (!(x1 > x0)) return undefined;
  const keys = table.columns.map((c) => c.key);
  const at = (x: number) =>
    Object.fromEntries(
      keys.map((k) => [k, first[k]! + ((last[k]! - first[k]!) * (x - x0)) / (x1 - x0)]),
    );
  for (let i = 0; i < table.rows.length; i++) {
    const row = table.rows[i]!;
    if (i > 0 && !(row[key]! > table.rows[i - 1]![key]!)) return undefined;
    const fit = at(row[key]!);
    for (const k of keys) {
      const y = row[k];
      if (y === undefined || !Number.isFinite(y)) return undefined;
      const scale = Math.max(Math.abs(first[k]!), Math.abs(last[k]!), Number.MIN_VALUE);
      if (Math.abs(fit[k]! - y) > LINEAR_TOLERANCE * scale * 10) return undefined;
    }
  }
  return { x0, x1, at };
}

const MARK_WORDS: Record<BandMark, string> = {
  'low end': 'low end of the band',
  'as set': 'as set',
  'high end': 'high end of the band',
};

/**
 * What an added or marked row stands for, in words ('' for a plain row of the table); `short`
 * for a narrow column whose heading already speaks of the band ('low end', 'as set').
 */
export function marksText(marks: readonly BandMark[], short = false): string {
  return marks.map((m) => (short ? m : MARK_WORDS[m])).join(', ');
}

/**
 * A row's verdict with what it stands for, as the sheet and the editor print it: "every check
 * passes (low end of the band)", "fails: p·v when the brake sets ≤ limit".
 */
export function rowVerdictText(row: SettingTableRow): string {
  return rowVerdict(row.failing) + (row.marks.length ? ` (${marksText(row.marks)})` : '');
}
