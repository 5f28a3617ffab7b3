import type { SettingBand, SheetEvaluation } from '../core/types.js';
import { toDisplay, type UnitSystem } from '../units/display.js';

/** The band stored with a setting table, if the evaluation carries one (newer records do). */
export function bandOf(
  ev: Pick<SheetEvaluation, 'settingBands'>,
  tableId: string,
): SettingBand | undefined {
  return ev.settingBands?.find((b) => b.tableId === tableId);
}

/**
 * A band end to three figures in the unit system, as the setting table prints its forces (a
 * spring force is set through the length, not read to finer), rounded into the band (the low end
 * up, the high end down), so the printed figure itself still passes every check.
 */
function bandEnd(v: number, end: 'low' | 'high', system: UnitSystem): string {
  const r = roundedInward(v, end, system);
  return r ? `${r.text} ${r.label}` : toDisplay(v, 'force', system).text;
}

/** The band end `bandEnd` prints, as an SI value (the setting a table row can be worked out at). */
export function bandEndValue(v: number, end: 'low' | 'high', system: UnitSystem): number {
  const r = roundedInward(v, end, system);
  return r ? r.si : v;
}

function roundedInward(v: number, end: 'low' | 'high', system: UnitSystem) {
  const d = toDisplay(v, 'force', system);
  const x = d.value;
  if (!(x > 0)) return undefined;
  const digits = Math.floor(Math.log10(x)) - 2;
  const step = 10 ** digits;
  const inward = (end === 'low' ? Math.ceil(x / step - 1e-9) : Math.floor(x / step + 1e-9)) * step;
  return { text: inward.toFixed(Math.max(0, -digits)), label: d.label, si: (inward / x) * v };
}

/**
 * Where every check of the sheet holds, in one paragraph: a setting table's rows come from the
 * torque limits alone, so a row inside them can still fail another check (p·v, the thruster, the
 * stop). Printed above the table on the sheet and the field card, and shown in the app. A sheet
 * approved with checks failing at its set value (each justified) says so first: its band is where
 * every other check passes, and "every check passes" would not be true of any setting.
 */
export function bandSentence(
  band: SettingBand,
  system: UnitSystem,
  ev: Pick<SheetEvaluation, 'checks'>,
): string {
  const what = band.tableId === 'clamp-setting' ? 'clamp force' : 'spring force';
  const set = toDisplay(band.set, 'force', system).text;
  const failingAtSet = ev.checks.filter((c) => !c.pass).map((c) => c.label);
  const below = band.lowLimitedBy
    ? ` Below it fails: ${band.lowLimitedBy.join('; ')}.`
    : ' Below it the table ends.';
  const above = band.highLimitedBy
    ? ` Above it fails: ${band.highLimitedBy.join('; ')}.`
    : ' Above it the table ends.';
  const range = `from ${bandEnd(band.low, 'low', system)} to ${bandEnd(band.high, 'high', system)}`;
  const opening =
    failingAtSet.length === 0
      ? `Every check of this sheet passes with the ${what} ${range} (worked out at ${set}).`
      : `At the set ${what} of ${set} ${failingAtSet.length === 1 ? 'this check fails' : 'these checks fail'}: ` +
        `${failingAtSet.join('; ')}. Every other check passes with the ${what} ${range}.`;
  return opening + below + above;
}

/** A row's verdict, short enough for a table cell ('' when the record carries none). */
export function rowVerdict(failing: readonly string[] | undefined): string {
  if (!failing) return '';
  if (failing.length === 0) return 'every check passes';
  const shown = failing.slice(0, 2).join('; ');
  return failing.length > 2
    ? `fails: ${shown} (and ${failing.length - 2} more)`
    : `fails: ${shown}`;
}

/**
 * A setting table's title in the unit system: the shoe sheets title their table with its force
 * range in newtons ("Spring setting table (new lining) from 771 to 1600 N"), which a US card prints in lbf like
 * its rows. Any other title is returned as it is.
 */
export function settingTableTitle(title: string, system: UnitSystem): string {
  if (system === 'SI') return title;
  const m = /^(.* from )(\d+(?:\.\d+)?) to (\d+(?:\.\d+)?) N$/.exec(title);
  if (!m) return title;
  const a = toDisplay(Number(m[2]), 'force', system);
  const b = toDisplay(Number(m[3]), 'force', system);
  return `${m[1]}${a.number} to ${b.number} ${b.label}`;
}
