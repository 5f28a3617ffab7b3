import type { FieldCheckKey } from '@holdfast/shared';
import { isoDay } from '../../../lib/dates';

/** The measurement the reserve-stroke trend is fitted to (the field card's key). */
export const RESERVE_KEY = 'reserveStroke';
/** The field-form target holding the minimum reserve stroke (printed, not measured). */
export const MIN_RESERVE_KEY = 'minReserveStroke';
/** The checks whose values are the lining thickness of each shoe. */
export const LINING_KEYS = [
  'lining-thickness-shoe-a',
  'lining-thickness-shoe-b',
] as const satisfies readonly FieldCheckKey[];

const DAY_S = 86400;
/** A time of a wear series or its fit (seconds since 1970) as a date. */
export const dateOf = (s: number) => new Date(s * 1000);
/**
 * The chart's x value of a series time: whole UTC days since 1970, the day `isoDay` names, so a
 * reading sits on the day the timeline and "Last inspected" give it (rounding put an afternoon
 * reading on the next day).
 */
export const chartDay = (s: number) => Math.floor(s / DAY_S);
/** The date an x value of the chart stands for, as `isoDay` writes it. */
export const chartDayText = (dayNumber: number) => isoDay(dateOf(dayNumber * DAY_S));
/** Wear rate in mm per 30 days, the unit the chart and text state it in. */
export const mmPerMonth = (rate: number) => rate * 1000 * 30 * DAY_S;

/**
 * The title of a lining chart: the label the field form gives the check item, which names shoes
 * on a drum brake and pads on a caliper brake (the server labels them per rotor). Until the form
 * has loaded, or if it lacks the item, the title names neither rather than guess.
 */
export function liningChartTitle(
  checks: readonly { key: FieldCheckKey; label: string }[] | undefined,
  key: (typeof LINING_KEYS)[number],
): string {
  const label = checks?.find((c) => c.key === key)?.label;
  if (label) return label;
  return `Lining thickness, ${key === 'lining-thickness-shoe-a' ? 'side A' : 'side B'}`;
}

/**
 * Whether a position has a reserve-stroke line to chart: a thruster's reserve stroke is on a shoe
 * brake's field card; a caliper's card has none, so its page shows no empty stroke chart (unless
 * readings of one were recorded all the same).
 */
export function hasStrokeSeries(
  targets: readonly { settingKey: string }[] | undefined,
  records: readonly { measurements: readonly { settingKey: string }[] }[],
): boolean {
  return (
    (targets ?? []).some((t) => t.settingKey === RESERVE_KEY) ||
    records.some((r) => r.measurements.some((m) => m.settingKey === RESERVE_KEY))
  );
}
