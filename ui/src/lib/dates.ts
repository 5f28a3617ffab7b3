/**
 * A day as ISO 8601 (2026-12-03), the way printed sheets and field records give it: never
 * 03/12/2026, which a reader used to month-first dates takes for the twelfth of March. The day
 * is that of the timestamp in UTC, as printouts state it.
 */
export function isoDay(timestamp: string | Date): string {
  const d = typeof timestamp === 'string' ? new Date(timestamp) : timestamp;
  return Number.isNaN(d.getTime()) ? '' : d.toISOString().slice(0, 10);
}
