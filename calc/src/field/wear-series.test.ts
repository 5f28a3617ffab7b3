import { describe, expect, it } from 'vitest';
import { length, time } from '../units/quantities.js';
import { liningSeries, strokeSeries, wearLineAt, type WearRecord } from './wear-series.js';

function rec(
  date: string,
  kind: string,
  found: number | null,
  left: number | null,
  lining?: number,
): WearRecord {
  return {
    performedAt: `${date}T08:00:00.000Z`,
    kind,
    measurements: [{ settingKey: 'reserveStroke', asFound: found, asLeft: left }],
    checks: lining === undefined ? [] : [{ key: 'lining-a', value: lining }],
  };
}

describe('wear series from field records', () => {
  it('starts at the last setting and predicts when the minimum is reached', () => {
    const records = [
      rec('2025-10-28', 'periodic-inspection', 0.0092, 0.0092, 0.0074),
      rec('2025-01-01', 'commissioning', null, 0.012, 0.008),
      rec('2025-04-11', 'periodic-inspection', 0.011, 0.011, 0.0078),
      rec('2025-07-20', 'periodic-inspection', 0.0104, 0.0104, 0.0075),
    ];
    const s = strokeSeries(records, 'reserveStroke', length(0.006));
    expect(s.readings.map((r) => r.value)).toEqual([0.012, 0.011, 0.0104, 0.0092]);
    expect(s.fit?.kind).toBe('trend');
    // Readings 100 days apart as in wear-trend's hand case (12.0, 11.0, 10.4, 9.2 mm): 666.67 days on.
    if (s.fit?.kind !== 'trend' || !s.fit.crossing) throw new Error('expected a crossing');
    const days = (s.fit.crossing.at - Date.parse('2025-01-01T08:00:00Z') / 1000) / 86400;
    expect(days).toBeCloseTo(666.67, 1);
    expect(wearLineAt(s.fit, s.fit.crossing.at)).toBeCloseTo(0.006, 9);
    expect(liningSeries(records, 'lining-a').readings).toHaveLength(4);
  });

  it("runs a lining's trend to the sheet's minimum thickness when it is given, and only then", () => {
    const records = [
      rec('2025-01-01', 'commissioning', null, 0.012, 0.008),
      rec('2025-04-11', 'periodic-inspection', 0.011, 0.011, 0.0078),
      rec('2025-07-20', 'periodic-inspection', 0.0104, 0.0104, 0.0075),
      rec('2025-10-28', 'periodic-inspection', 0.0092, 0.0092, 0.0074),
    ];
    const none = liningSeries(records, 'lining-a');
    expect(none.minimum).toBeNull();
    expect(none.fit?.kind === 'trend' && none.fit.crossing).toBeFalsy();
    const s = liningSeries(records, 'lining-a', length(0.003));
    expect(s.minimum).toBe(0.003);
    if (s.fit?.kind !== 'trend' || !s.fit.crossing) throw new Error('expected a crossing');
    expect(wearLineAt(s.fit, s.fit.crossing.at)).toBeCloseTo(0.003, 9);
    // About 0.2 mm per 100 days from 8 mm: 3 mm is years away, after the last reading.
    expect(s.fit.crossing.at).toBeGreaterThan(Date.parse('2027-01-01T00:00:00Z') / 1000);
  });

  it('a re-adjustment or an adjusted as-left starts a new line; too few readings is said', () => {
    const records = [
      rec('2025-01-01', 'commissioning', null, 0.012),
      rec('2025-04-11', 'periodic-inspection', 0.011, 0.011),
      rec('2025-07-20', 're-adjustment', 0.0075, 0.012),
      rec('2025-10-28', 'periodic-inspection', 0.0112, 0.0112),
    ];
    const s = strokeSeries(records, 'reserveStroke', length(0.006));
    expect(s.readings.map((r) => r.value)).toEqual([0.012, 0.0112]);
    expect(s.fit).toBeNull();
    expect(s.note).toBe('A wear trend needs at least 3 readings (got 2).');
    expect(strokeSeries([], 'reserveStroke', null).note).toBe('No readings yet.');
    const adjusted = [...records.slice(0, 2), rec('2025-07-20', 'after-repair', 0.008, 0.0125)];
    expect(strokeSeries(adjusted, 'reserveStroke', null).readings).toEqual([
      { at: time(Date.parse('2025-07-20T08:00:00Z') / 1000), value: 0.0125 },
    ]);
  });

  it('new linings restart the thickness series', () => {
    const records = [
      rec('2025-01-01', 'commissioning', null, 0.012, 0.008),
      rec('2025-04-11', 'periodic-inspection', 0.011, 0.011, 0.004),
      rec('2025-07-20', 'lining-replacement', 0.011, 0.012, 0.009),
    ];
    expect(liningSeries(records, 'lining-a').readings.map((r) => r.value)).toEqual([0.009]);
  });
});
