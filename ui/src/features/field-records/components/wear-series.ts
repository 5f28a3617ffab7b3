import {
  fitWearTrend,
  isCalcInputError,
  length,
  time,
  type WearReading,
  type WearTrend,
} from '@holdfast/calc';
import type { FieldRecord } from '@holdfast/shared';

const DAY_S = 86400;
/** The measurement the reserve-stroke trend is fitted to (the field card's key). */
export const RESERVE_KEY = 'reserveStroke';
/** The field-form target holding the minimum reserve stroke (printed, not measured). */
export const MIN_RESERVE_KEY = 'minReserveStroke';
const RESET_KINDS = new Set<FieldRecord['kind']>([
  'commissioning',
  're-adjustment',
  'lining-replacement',
]);

export interface WearSeries {
  /** Readings since the brake was last set: the as-left value then, the as-found values after. */
  readings: { at: Date; value: number }[];
  /** The minimum reserve stroke (the field form's 'minReserveStroke' target), SI, when known. */
  minimum: number | null;
  fit: WearTrend | null;
  /** Why there is no fit (too few readings, no spread), in the fitter's words. */
  note: string | null;
}

const seconds = (iso: string) => Date.parse(iso) / 1000;

/**
 * The reserve-stroke series of a position since its last setting. A re-adjustment, lining
 * change or commissioning sets the stroke anew, so readings before it belong to another line.
 */
export function reserveStrokeSeries(
  records: readonly FieldRecord[],
  minimum: number | null,
): WearSeries {
  const sorted = [...records].sort((a, b) => a.performedAt.localeCompare(b.performedAt));
  let readings: WearSeries['readings'] = [];
  for (const r of sorted) {
    const m = r.measurements.find((x) => x.settingKey === RESERVE_KEY);
    if (!m) continue;
    const at = new Date(r.performedAt);
    const reset = RESET_KINDS.has(r.kind) || (m.asLeft !== null && m.asLeft !== m.asFound);
    if (m.asFound !== null && !RESET_KINDS.has(r.kind)) readings.push({ at, value: m.asFound });
    if (reset && m.asLeft !== null) readings = [{ at, value: m.asLeft }];
  }
  return { readings, minimum, ...fit(readings, minimum, 'reserveStroke') };
}

/** Lining thickness of one shoe over all records (a lining change starts a new series). */
export function liningSeries(
  records: readonly FieldRecord[],
  key: 'lining-thickness-shoe-a' | 'lining-thickness-shoe-b',
): WearSeries {
  const sorted = [...records].sort((a, b) => a.performedAt.localeCompare(b.performedAt));
  let readings: WearSeries['readings'] = [];
  for (const r of sorted) {
    const c = r.checks.find((x) => x.key === key);
    if (!c || c.value === null) continue;
    if (r.kind === 'lining-replacement') readings = [];
    readings.push({ at: new Date(r.performedAt), value: c.value });
  }
  return { readings, minimum: null, ...fit(readings, null, key) };
}

function fit(
  readings: WearSeries['readings'],
  minimum: number | null,
  field: string,
): Pick<WearSeries, 'fit' | 'note'> {
  const points: WearReading[] = readings.map((r) => ({
    at: time(seconds(r.at.toISOString())),
    value: length(r.value),
  }));
  try {
    const result = fitWearTrend({
      readings: points,
      minimum: minimum === null ? undefined : length(minimum),
      field,
    });
    return { fit: result, note: result.kind === 'no-trend' ? result.reason : null };
  } catch (e) {
    if (isCalcInputError(e)) return { fit: null, note: e.fields[0]?.message ?? e.message };
    throw e;
  }
}

/** A time from the fit (seconds since 1970) as a date. */
export const dateOf = (s: number) => new Date(s * 1000);
/** Wear rate in mm per 30 days, the unit the chart and text state it in. */
export const mmPerMonth = (rate: number) => rate * 1000 * 30 * DAY_S;
