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

/**
 * A moment typed the way `isoDayTime` shows it (2026-12-04 21:59, in the reader's clock), or
 * null when the text is not one. A `T` between day and time (2026-12-04T21:59, as the browser's
 * date-time box kept it in earlier drafts) is read too.
 */
export function parseIsoDayTime(text: string): Date | null {
  const m = /^\s*(\d{4})-(\d{2})-(\d{2})[ T](\d{2}):(\d{2})\s*$/.exec(text);
  if (!m) return null;
  const [year, month, day, hour, minute] = m.slice(1).map(Number) as [
    number,
    number,
    number,
    number,
    number,
  ];
  const d = new Date(year, month - 1, day, hour, minute);
  // Date rolls 2026-02-30 over into March and 25:00 into the next day: refuse those instead
  // of recording a moment the fitter did not type.
  const same =
    d.getFullYear() === year &&
    d.getMonth() === month - 1 &&
    d.getDate() === day &&
    d.getHours() === hour &&
    d.getMinutes() === minute;
  return same ? d : null;
}
