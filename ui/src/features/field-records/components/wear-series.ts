import type { FieldCheckKey } from '@holdfast/shared';

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
/** Wear rate in mm per 30 days, the unit the chart and text state it in. */
export const mmPerMonth = (rate: number) => rate * 1000 * 30 * DAY_S;
