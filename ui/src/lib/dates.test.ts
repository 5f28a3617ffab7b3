import { describe, expect, it } from 'vitest';
import { isoDay, isoDayTime, parseIsoDayTime } from './dates';

describe('isoDay', () => {
  it('gives the UTC day of a timestamp as ISO 8601, as the printouts do', () => {
    expect(isoDay('2026-12-03T23:30:00.000Z')).toBe('2026-12-03');
    expect(isoDay('2026-03-12T00:00:00.000Z')).toBe('2026-03-12');
    expect(isoDay(new Date(Date.UTC(2026, 0, 5, 12)))).toBe('2026-01-05');
  });

  it('gives nothing for a timestamp it cannot read', () => {
    expect(isoDay('not a date')).toBe('');
  });
});

describe('isoDayTime', () => {
  it('gives a moment in the reader’s clock, day first in ISO order', () => {
    const local = new Date(2026, 2, 12, 7, 5, 9);
    expect(isoDayTime(local)).toBe('2026-03-12 07:05');
    expect(isoDayTime(local, true)).toBe('2026-03-12 07:05:09');
    expect(isoDayTime(local.toISOString())).toBe('2026-03-12 07:05');
    expect(isoDayTime('not a date')).toBe('');
  });
});

describe('parseIsoDayTime', () => {
  it('reads a moment as isoDayTime writes it, in the reader’s clock', () => {
    const typed = parseIsoDayTime('2026-12-04 21:59');
    expect(typed?.getTime()).toBe(new Date(2026, 11, 4, 21, 59).getTime());
    expect(isoDayTime(typed!)).toBe('2026-12-04 21:59');
    expect(parseIsoDayTime(' 2026-12-04T21:59 ')?.getTime()).toBe(typed?.getTime());
  });

  it('refuses a month-first or day-first date and a day or hour that does not exist', () => {
    for (const text of [
      '12/04/2026, 09:59 PM',
      '04.12.2026 21:59',
      '2026-02-30 10:00',
      '2026-12-04 25:00',
      '2026-12-04',
      '',
    ])
      expect(parseIsoDayTime(text)).toBeNull();
  });
});
