import { isCalcInputError } from '../core/errors.js';
import type { Length, Time } from '../units/quantities.js';
import { fitWearTrend, type WearReading, type WearTrend, type WearTrendFit } from './wear-trend.js';

/**
 * One field record as a wear series reads it. Structural, so the API's field record fits as it
 * is: values in SI, `performedAt` an ISO 8601 date-time, `kind` the kind of work done.
 */
export interface WearRecord {
  performedAt: string;
  kind: string;
  measurements: readonly { settingKey: string; asFound: number | null; asLeft: number | null }[];
  checks: readonly { key: string; value: number | null }[];
}

/**
 * Work after which a thruster's reserve stroke is set anew, so earlier readings belong to another
 * line (common practice): the first setting, a re-adjustment for wear, new linings.
 */
export const STROKE_SETTING_KINDS: readonly string[] = [
  'commissioning',
  're-adjustment',
  'lining-replacement',
];
/** Work after which the lining thickness starts again from new. */
export const LINING_CHANGE_KIND = 'lining-replacement';

export interface WearSeries {
  /** The readings of the current line, oldest first; `at` in seconds since 1970-01-01 UTC. */
  readings: WearReading[];
  /** The length at which action is due, when known. */
  minimum: Length | null;
  /** The fitted trend; null when there are too few readings or no spread in time. */
  fit: WearTrend | null;
  /** Why there is no prediction (too few readings, no spread, no wear trend), in plain words. */
  note: string | null;
}

const seconds = (iso: string) => (Date.parse(iso) / 1000) as Time;
const byDate = (records: readonly WearRecord[]) =>
  [...records].sort((a, b) => seconds(a.performedAt) - seconds(b.performedAt));

/**
 * A setting's readings since it was last set: the as-left value of the last setting (a setting
 * kind of work, or an as-left value different from the as-found one), then the as-found values
 * of the inspections after it, with the trend to `minimum`.
 */
export function strokeSeries(
  records: readonly WearRecord[],
  settingKey: string,
  minimum: Length | null,
): WearSeries {
  let readings: WearReading[] = [];
  for (const r of byDate(records)) {
    const m = r.measurements.find((x) => x.settingKey === settingKey);
    if (!m) continue;
    const at = seconds(r.performedAt);
    const setting = STROKE_SETTING_KINDS.includes(r.kind);
    if (m.asFound !== null && !setting) readings.push({ at, value: m.asFound as Length });
    if ((setting || (m.asLeft !== null && m.asLeft !== m.asFound)) && m.asLeft !== null) {
      readings = [{ at, value: m.asLeft as Length }];
    }
  }
  return { readings, minimum, ...fitOrNote(readings, minimum, settingKey) };
}

/**
 * The values of one check (a lining thickness) since the linings were last changed, with the
 * trend to `minimum` (the sheet's minimum lining thickness) when it is known.
 */
export function liningSeries(
  records: readonly WearRecord[],
  checkKey: string,
  minimum: Length | null = null,
): WearSeries {
  let readings: WearReading[] = [];
  for (const r of byDate(records)) {
    const c = r.checks.find((x) => x.key === checkKey);
    if (!c || c.value === null) continue;
    if (r.kind === LINING_CHANGE_KIND) readings = [];
    readings.push({ at: seconds(r.performedAt), value: c.value as Length });
  }
  return { readings, minimum, ...fitOrNote(readings, minimum, checkKey) };
}

function fitOrNote(
  readings: WearReading[],
  minimum: Length | null,
  field: string,
): Pick<WearSeries, 'fit' | 'note'> {
  try {
    const fit = fitWearTrend({ readings, minimum: minimum ?? undefined, field });
    return { fit, note: fit.kind === 'no-trend' ? fit.reason : null };
  } catch (e) {
    if (isCalcInputError(e))
      return { fit: null, note: noteFor(readings, e.fields[0]?.message ?? e.message) };
    throw e;
  }
}

/** Why there is no trend, as a sentence for the page: the core's message, or "No readings yet." */
function noteFor(readings: readonly WearReading[], message: string): string {
  if (readings.length === 0) return 'No readings yet.';
  return message.charAt(0).toUpperCase() + message.slice(1) + (message.endsWith('.') ? '' : '.');
}

/** The fitted line's value at a time, taken about the mean time (exact with epoch-sized times). */
export function wearLineAt(fit: WearTrendFit, at: Time): Length {
  return (fit.meanValue + fit.slope * (at - fit.meanAt)) as Length;
}
