import { describe, expect, it } from 'vitest';
import { getCriteriaSet } from '../criteria/lookup.js';
import { demoInputs, getSheetType } from './registry.js';
import { settingBands } from './setting-band.js';
import { rowVerdictText, settingTableRows } from './setting-band-rows.js';
import type { SettingBand, SheetEvaluation } from '../core/types.js';

const SHEETS: [string, string][] = [
  ['hoist-shoe-brake', 'crane-hoist'],
  ['travel-shoe-brake', 'travel-drive'],
  ['drive-shoe-brake', 'general-industry'],
  ['caliper-disc-brake', 'general-industry'],
];
/** The rows of `table` on a record that carries `band`, with a check failing at set or none. */
function rowsOf(table: SheetEvaluation['tables'][number], band?: SettingBand, failsAtSet = false) {
  const checks = failsAtSet ? [{ pass: false } as SheetEvaluation['checks'][number]] : [];
  return settingTableRows({ checks, ...(band ? { settingBands: [band] } : {}) }, table, 'SI');
}

const INPUT: Record<string, string> = {
  'spring-setting': 'springForce',
  'clamp-setting': 'clampForce',
};

describe('setting table rows with the band put in', () => {
  for (const [id, set] of SHEETS) {
    it(`${id}: the added rows are the sheet worked out at those settings, and every check passes there`, () => {
      const criteria = getCriteriaSet(set)!;
      const sheet = getSheetType(id)!;
      const inputs = demoInputs(sheet);
      const ev = sheet.evaluate(inputs, criteria);
      const band = settingBands(sheet, inputs, criteria, ev)[0]!;
      const table = ev.tables.find((t) => t.id === band.tableId)!;
      const input = INPUT[band.tableId]!;
      const key = table.columns[0]!.key;
      const rows = rowsOf(table, band);
      const marked = rows.filter((r) => r.marks.length > 0);
      const passingRows = band.failing.filter((f) => f.length === 0).length;
      // The table's own steps may already show where the sheet passes: then only the set value
      // is put in (or marked), else the band's ends too.
      expect(marked.flatMap((r) => r.marks).sort()).toEqual(
        passingRows >= 2 ? ['as set'] : ['as set', 'high end', 'low end'],
      );
      // In order of the setting, the table's own rows all still there.
      const xs = rows.map((r) => r.values[key]!);
      expect(xs).toEqual([...xs].sort((a, b) => a - b));
      expect(rows.filter((r) => table.rows.includes(r.values as never))).toHaveLength(
        table.rows.length,
      );
      for (const r of marked) {
        const x = r.values[key]!;
        const at = sheet.evaluate({ ...inputs, [input]: { value: x, unit: 'N' } }, criteria);
        expect(at.checks.filter((c) => !c.pass).map((c) => c.label)).toEqual([]);
        expect(r.failing).toEqual([]);
        // Each column as the sheet's own table gives it at this setting (the table's lines do not
        // move with the set value).
        const own = at.tables.find((t) => t.id === table.id)!.rows;
        const line = (k: string) => {
          const [a, b] = [own[0]!, own[own.length - 1]!];
          return a[k]! + ((b[k]! - a[k]!) * (x - a[key]!)) / (b[key]! - a[key]!);
        };
        for (const c of table.columns) expect(r.values[c.key]).toBeCloseTo(line(c.key), 6);
      }
      // The set value's row carries the sheet's own set length.
      const asSet = rows.find((r) => r.marks.includes('as set'))!;
      const lengthKey = table.columns[1]!.key;
      const setLength = ev.fieldSettings.find((f) => f.key === lengthKey)?.value;
      if (setLength !== undefined) expect(asSet.values[lengthKey]).toBeCloseTo(setLength, 9);
    });
  }

  const table: SheetEvaluation['tables'][number] = {
    id: 'spring-setting',
    title: 't',
    columns: [
      { key: 'springForce', label: 'F', unit: 'N', dimension: 'force' },
      { key: 'torque', label: 'M', unit: 'N m', dimension: 'torque' },
    ],
    rows: [
      { springForce: 1000, torque: 300 },
      { springForce: 1500, torque: 450 },
      { springForce: 2000, torque: 600 },
    ],
  };
  const band: SettingBand = {
    tableId: 'spring-setting',
    set: 1250,
    failing: [['p·v'], [], ['stop']],
    low: 1123.4,
    high: 1777.7,
    lowLimitedBy: ['p·v'],
    highLimitedBy: ['stop'],
  };

  it('puts the ends in rounded inward as the band sentence prints them, read off the straight line', () => {
    const rows = rowsOf(table, band);
    expect(rows.map((r) => [r.values.springForce, r.values.torque, r.marks])).toEqual([
      [1000, 300, []],
      [1130, 339, ['low end']],
      [1250, 375, ['as set']],
      [1500, 450, []],
      [1770, 531, ['high end']],
      [2000, 600, []],
    ]);
    expect(rows.map((r) => r.failing)).toEqual([['p·v'], [], [], [], [], ['stop']]);
    expect(rows.map(rowVerdictText)).toEqual([
      'fails: p·v',
      'every check passes (low end of the band)',
      'every check passes (as set)',
      'every check passes',
      'every check passes (high end of the band)',
      'fails: stop',
    ]);
  });

  it('the demo hoist: the band falls between two steps of the table, so its rows are added', () => {
    const criteria = getCriteriaSet('crane-hoist')!;
    const sheet = getSheetType('hoist-shoe-brake')!;
    const inputs = demoInputs(sheet);
    const ev = sheet.evaluate(inputs, criteria);
    const band = settingBands(sheet, inputs, criteria, ev)[0]!;
    expect(band.failing.every((f) => f.length > 0)).toBe(true);
    const rows = rowsOf(
      ev.tables.find((t) => t.id === band.tableId)!,
      band,
    );
    expect(rows.filter((r) => r.failing?.length === 0)).toHaveLength(3);
  });

  it('adds only the set value where two rows of the table already pass', () => {
    const wide = { ...band, failing: [[], [], ['stop']] };
    const rows = rowsOf(table, wide);
    expect(rows).toHaveLength(4);
    expect(
      rows.filter((r) => r.marks.length > 0).map((r) => [r.values.springForce, r.marks]),
    ).toEqual([[1250, ['as set']]]);
  });

  it('marks a row of the table that is a point of the band instead of adding one', () => {
    const rows = rowsOf(table, { ...band, set: 1500 });
    expect(rows).toHaveLength(5);
    expect(rows[2]!.marks).toEqual(['as set']);
  });

  it('adds nothing without a band, with checks failing at the set value, or when a column is not straight', () => {
    expect(rowsOf(table).every((r) => r.marks.length === 0 && r.failing === undefined)).toBe(true);
    expect(rowsOf(table, band, true)).toHaveLength(3);
    const bent = {
      ...table,
      rows: [...table.rows.slice(0, 2), { springForce: 2000, torque: 650 }],
    };
    expect(rowsOf(bent, band)).toHaveLength(3);
  });
});
