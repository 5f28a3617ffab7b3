import type { InspectionInterval, NextDue } from '@holdfast/shared';

const DAY_MS = 86_400_000;

export interface ScheduleFacts {
  basis: InspectionInterval['basis'];
  every: number;
  remindDaysAhead: number;
  /** When the interval was set: the first due date counts from it until a record exists. */
  intervalSince: Date;
  lastPerformedAt: Date | null;
  lastMeterHours: number | null;
}

/**
 * When the next inspection is due. Days: `every` days after the last signed record (or after the
 * interval was set). Hours: `every` hours of meter after the last record's reading; with no meter
 * reading from the plant between visits, an hours-based position is never called overdue here.
 */
export function nextDue(f: ScheduleFacts, now: Date): NextDue {
  if (f.basis === 'hours') {
    return { date: null, meterHours: (f.lastMeterHours ?? 0) + f.every, overdue: false };
  }
  const from = f.lastPerformedAt ?? f.intervalSince;
  const due = new Date(from.getTime() + f.every * DAY_MS);
  return { date: due.toISOString(), meterHours: null, overdue: now.getTime() > due.getTime() };
}

/** Whether a days-based due date falls inside the reminder window (not yet overdue). */
export function inReminderWindow(f: ScheduleFacts, due: NextDue, now: Date): boolean {
  if (!due.date || due.overdue) return false;
  return new Date(due.date).getTime() - f.remindDaysAhead * DAY_MS <= now.getTime();
}
