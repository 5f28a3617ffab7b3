import { describe, expect, it } from 'vitest';
import type { FieldForm } from '@holdfast/shared';
import { isoDay } from '../../../lib/dates';
import {
  chartDay,
  chartDayText,
  hasStrokeSeries,
  LINING_KEYS,
  liningChartTitle,
} from './wear-series';

// As the field-form API labels them per rotor (server/src/calc/field-targets.ts).
const drum: FieldForm['checks'] = [
  { key: 'lining-thickness-shoe-a', label: 'Lining thickness, shoe A', hasValue: true },
  { key: 'lining-thickness-shoe-b', label: 'Lining thickness, shoe B', hasValue: true },
];
const disc: FieldForm['checks'] = [
  { key: 'no-drag-shoe-a', label: 'No drag on pad A when released', hasValue: false },
  { key: 'lining-thickness-shoe-a', label: 'Lining thickness, pad A', hasValue: true },
  { key: 'lining-thickness-shoe-b', label: 'Lining thickness, pad B', hasValue: true },
];

describe('lining chart titles', () => {
  it('say shoes on a drum brake and pads on a caliper brake, as the field form labels them', () => {
    expect(LINING_KEYS.map((k) => liningChartTitle(drum, k))).toEqual([
      'Lining thickness, shoe A',
      'Lining thickness, shoe B',
    ]);
    expect(LINING_KEYS.map((k) => liningChartTitle(disc, k))).toEqual([
      'Lining thickness, pad A',
      'Lining thickness, pad B',
    ]);
  });

  it('name neither shoe nor pad before the form has loaded', () => {
    const titles = LINING_KEYS.map((k) => liningChartTitle(undefined, k));
    expect(titles).toEqual(['Lining thickness, side A', 'Lining thickness, side B']);
    for (const t of [...titles, ...LINING_KEYS.map((k) => liningChartTitle([], k))]) {
      expect(t).not.toMatch(/shoe|pad/);
    }
  });
});

describe('hasStrokeSeries', () => {
  const reading = (settingKey: string) => ({ measurements: [{ settingKey }] });

  it("charts the reserve stroke where the field card has one (a shoe brake's thruster)", () => {
    expect(
      hasStrokeSeries([{ settingKey: 'springLength' }, { settingKey: 'reserveStroke' }], []),
    ).toBe(true);
  });

  it("leaves it out for a caliper's card, which has none, unless a reading was recorded", () => {
    const caliper = [{ settingKey: 'clampForce' }, { settingKey: 'airGap' }];
    expect(hasStrokeSeries(caliper, [reading('airGap')])).toBe(false);
    expect(hasStrokeSeries(undefined, [])).toBe(false);
    expect(hasStrokeSeries(caliper, [reading('reserveStroke')])).toBe(true);
  });
});

describe('chart days', () => {
  it('put a reading on the day the timeline gives it, however late in the day it was taken', () => {
    for (const at of ['2026-10-10T00:00:00Z', '2026-10-10T13:00:00Z', '2026-10-10T21:59:00Z']) {
      const seconds = Date.parse(at) / 1000;
      expect(chartDayText(chartDay(seconds))).toBe(isoDay(at));
      expect(chartDayText(chartDay(seconds))).toBe('2026-10-10');
    }
  });
});
