/**
 * A day as ISO 8601 (2026-12-03), the way printed sheets and field records give it: never
 * 03/12/2026, which a reader used to month-first dates takes for the twelfth of March. The day
 * is that of the timestamp in UTC, as printouts state it.
 */
export function isoDay(timestamp: string | Date): string {
  const d = typeof timestamp === 'string' ? new Date(timestamp) : timestamp;
  return Number.isNaN(d.getTime()) ? '' : d.toISOString().slice(0, 10);
}

const pad = (n: number) => String(n).padStart(2, '0');

/**
 * A moment as ISO 8601 in the reader's own clock (2026-12-03 14:05, or 14:05:09 with seconds):
 * the same order as `isoDay`, so no screen mixes 03/12/2026, 3 Dec 2026 and 2026-12-03.
 */
export function isoDayTime(timestamp: string | Date, withSeconds = false): string {
  const d = typeof timestamp === 'string' ? new Date(timestamp) : timestamp;
  if (Number.isNaN(d.getTime())) return '';
  const day = `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`;
  const time = `${pad(d.getHours())}:${pad(d.getMinutes())}`;
  return `${day} ${time}${withSeconds ? `:${pad(d.getSeconds())}` : ''}`;
}
