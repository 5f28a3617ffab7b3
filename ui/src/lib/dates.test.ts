import { describe, expect, it } from 'vitest';
import { isoDay } from './dates';

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
