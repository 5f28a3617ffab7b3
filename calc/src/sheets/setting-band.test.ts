import { describe, expect, it } from 'vitest';
import { getCriteriaSet } from '../criteria/lookup.js';
import { demoInputs, getSheetType } from './registry.js';
import { settingBands } from './setting-band.js';
import { bandOf, bandSentence, rowVerdict, settingTableTitle } from './setting-band-words.js';

const criteria = getCriteriaSet('general-industry')!;
const SHEETS = ['hoist-shoe-brake', 'travel-shoe-brake', 'drive-shoe-brake', 'caliper-disc-brake'];
const INPUT: Record<string, string> = {
  'spring-setting': 'springForce',
  'clamp-setting': 'clampForce',
};

describe('setting tables checked against the whole sheet', () => {
  for (const id of SHEETS) {
    it(`${id}: each row carries the sheet's own verdict at that setting`, () => {
      const sheet = getSheetType(id)!;
      const inputs = demoInputs(sheet);
      const ev = sheet.evaluate(inputs, criteria);
      const bands = settingBands(sheet, inputs, criteria, ev);
      expect(bands).toHaveLength(1);
      const band = bands[0]!;
      const table = ev.tables.find((t) => t.id === band.tableId)!;
      const input = INPUT[band.tableId]!;
      expect(band.failing).toHaveLength(table.rows.length);
      table.rows.forEach((row, k) => {
        const value = Object.values(row)[0]!;
        const at = sheet.evaluate({ ...inputs, [input]: { value, unit: 'N' } }, criteria);
        expect(band.failing[k]).toEqual(at.checks.filter((c) => !c.pass).map((c) => c.label));
      });
    });

    it(`${id}: the band holds the set value and ends where a check starts to fail`, () => {
      const sheet = getSheetType(id)!;
      const inputs = demoInputs(sheet);
      const ev = sheet.evaluate(inputs, criteria);
      const band = settingBands(sheet, inputs, criteria, ev)[0]!;
      const input = INPUT[band.tableId]!;
      const failing = (value: number) =>
        sheet
          .evaluate({ ...inputs, [input]: { value, unit: 'N' } }, criteria)
          .checks.filter((c) => !c.pass)
          .map((c) => c.label);
      expect(band.low).toBeLessThanOrEqual(band.set);
      expect(band.high).toBeGreaterThanOrEqual(band.set);
      // Every check passes at both ends (the demo sheets pass at their set values) …
      expect(failing(band.low)).toEqual([]);
      expect(failing(band.high)).toEqual([]);
      // … and 0.2 % beyond an end that a check limits, that check fails.
      if (band.lowLimitedBy)
        expect(failing(band.low - 0.002 * band.set)).toEqual(band.lowLimitedBy);
      if (band.highLimitedBy)
        expect(failing(band.high + 0.002 * band.set)).toEqual(band.highLimitedBy);
    });
  }

  it('finds the demo hoist band narrower than its table: the stop below, p·v above', () => {
    const sheet = getSheetType('hoist-shoe-brake')!;
    const inputs = demoInputs(sheet);
    const ev = sheet.evaluate(inputs, criteria);
    const band = settingBands(sheet, inputs, criteria, ev)[0]!;
    const rows = ev.tables[0]!.rows.map((r) => r.springForce!);
    expect(band.low).toBeGreaterThan(rows[0]!);
    expect(band.high).toBeLessThan(rows[rows.length - 1]!);
    expect(band.lowLimitedBy).toContain('Stopping distance at the load ≤ allowed');
    expect(band.highLimitedBy).toEqual(['p·v when the brake sets ≤ limit']);
  });

  it('does not let a check that already fails at the set value end the band', () => {
    const sheet = getSheetType('hoist-shoe-brake')!;
    // Stopping distance allowed cut to 1 mm: fails at every setting the table offers.
    const inputs = { ...demoInputs(sheet), maxStoppingDistance: { value: 1, unit: 'mm' } };
    const ev = sheet.evaluate(inputs, criteria);
    expect(ev.checks.some((c) => c.id.startsWith('stopping') && !c.pass)).toBe(true);
    const band = settingBands(sheet, inputs, criteria, ev)[0]!;
    expect(band.lowLimitedBy ?? []).not.toContain('Stopping distance at the load ≤ allowed');
    expect(band.failing.every((f) => f.includes('Stopping distance at the load ≤ allowed'))).toBe(
      true,
    );
  });
});

describe('setting band in words', () => {
  const band = {
    tableId: 'spring-setting',
    set: 1150,
    failing: [[], ['p·v when the brake sets ≤ limit', 'A', 'B']],
    low: 1113.71,
    high: 1176.42,
    lowLimitedBy: ['Stopping distance at the load ≤ allowed'],
    highLimitedBy: null,
  };

  it('rounds each end into the band, so the printed figure still passes', () => {
    const s = bandSentence(band, 'SI', { checks: [] });
    expect(s).toContain('from 1120 N to 1170 N (worked out at 1150 N)');
    expect(s).toContain('Below it fails: Stopping distance at the load ≤ allowed.');
    expect(s).toContain('Above it the table ends.');
    // 1113.71 N = 250.37 lbf and 1176.42 N = 264.47 lbf: up and down at three figures.
    expect(bandSentence(band, 'US', { checks: [] })).toContain('from 251 lbf to 264 lbf');
  });

  it('names the checks that fail at the set value, and the band then holds every other check', () => {
    const failing = [
      { label: 'Stopping distance at the load ≤ allowed', pass: false },
      { label: 'Lining pressure ≤ limit', pass: true },
    ];
    const s = bandSentence(band, 'SI', { checks: failing as never });
    expect(s).toMatch(
      /^At the set spring force of 1150 N this check fails: Stopping distance at the load ≤ allowed\. Every other check passes with the spring force from 1120 N to 1170 N\./,
    );
    expect(s).not.toContain('Every check of this sheet passes');
  });

  it('gives each row a short verdict', () => {
    expect(rowVerdict(band.failing[0])).toBe('every check passes');
    expect(rowVerdict(band.failing[1])).toBe(
      'fails: p·v when the brake sets ≤ limit; A (and 1 more)',
    );
    expect(rowVerdict(undefined)).toBe('');
    expect(bandOf({ settingBands: [band] }, 'spring-setting')).toBe(band);
    expect(bandOf({}, 'spring-setting')).toBeUndefined();
  });
});

describe('setting table titles in the unit system', () => {
  it('gives the shoe table’s force range in lbf on a US sheet, as its rows', () => {
    const t = 'Spring setting table (new lining) from 771 to 1600 N';
    expect(settingTableTitle(t, 'SI')).toBe(t);
    expect(settingTableTitle(t, 'US')).toBe(
      'Spring setting table (new lining) from 173 to 360 lbf',
    );
    expect(settingTableTitle('Clamp force setting table (new pads)', 'US')).toBe(
      'Clamp force setting table (new pads)',
    );
  });
});
