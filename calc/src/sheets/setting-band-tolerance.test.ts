import { describe, expect, it } from 'vitest';
import { getCriteriaSet } from '../criteria/lookup.js';
import type { SettingBand, SheetEvaluation } from '../core/types.js';
import { SPRING_LENGTH } from '../field/tolerances.js';
import { demoInputs, getSheetType } from './registry.js';
import { settingBands } from './setting-band.js';
import { bandedTolerance, toleranceBeyondBand } from './setting-band-tolerance.js';
import { toleranceBounds } from '../field/evaluate-tolerance.js';

function demo(id: string, set: string) {
  const criteria = getCriteriaSet(set)!;
  const sheet = getSheetType(id)!;
  const inputs = demoInputs(sheet);
  const ev = sheet.evaluate(inputs, criteria);
  const band = settingBands(sheet, inputs, criteria, ev)[0]!;
  ev.settingBands = [band];
  const table = ev.tables.find((t) => t.id === band.tableId)!;
  const failingAt = (force: number) =>
    sheet
      .evaluate({ ...inputs, springForce: { value: force, unit: 'N' } }, criteria)
      .checks.filter((c) => !c.pass)
      .map((c) => c.label);
  return { sheet, ev, band, table, failingAt };
}

describe('field tolerances against the band where every check passes', () => {
  it('demo hoist: ±5 % on the spring force reaches settings that fail, ±0.5 mm on the length does not', () => {
    const { sheet, ev, band, table, failingAt } = demo('hoist-shoe-brake', 'crane-hoist');
    const said = toleranceBeyondBand(ev, table, sheet.fieldCard, 'SI');
    expect(said).toEqual([
      'Main spring force as set ± 5 % would span 1090 N … 1210 N, past the band: the field card ' +
        'and the records hold it to −30 N / +20 N (1120 N … 1170 N).',
    ]);
    // The card and the records use the narrowed tolerance; the length's stays as declared.
    const force = ev.fieldSettings.find((f) => f.key === 'springForce')!;
    const held = bandedTolerance(force, sheet.fieldCard, ev)!;
    expect(held.source).toMatch(/narrowed to the band where every check of this sheet passes$/);
    const { lower, upper } = toleranceBounds(force.value, held);
    expect(failingAt(lower!)).toEqual([]);
    expect(failingAt(upper!)).toEqual([]);
    const lengthSetting = ev.fieldSettings.find((f) => f.key === 'springLength')!;
    expect(bandedTolerance(lengthSetting, sheet.fieldCard, ev)).toBe(
      sheet.fieldCard.settings.springLength!.tolerance,
    );
    // What it says is so: the sheet worked out at the tolerance's ends fails the checks the band
    // sentence beside it names.
    const set = ev.fieldSettings.find((f) => f.key === 'springForce')!.value;
    expect(failingAt(set * 0.95)).toEqual(band.lowLimitedBy);
    expect(failingAt(set * 1.05)).toEqual(band.highLimitedBy);
    // And the length's tolerance is safe: its ends stay inside the band.
    const length = ev.fieldSettings.find((f) => f.key === 'springLength')!.value;
    const rate = 40_000; // N/m, the demo spring
    expect(failingAt(set + rate * 0.0005)).toEqual([]);
    expect(failingAt(set - rate * 0.0005)).toEqual([]);
    expect(length).toBeGreaterThan(0);
  });

  it('drive sheet demo: every tolerance inside the band, nothing said', () => {
    const { sheet, ev, table, failingAt } = demo('drive-shoe-brake', 'general-industry');
    expect(toleranceBeyondBand(ev, table, sheet.fieldCard, 'SI')).toEqual([]);
    for (const f of ev.fieldSettings)
      expect(bandedTolerance(f, sheet.fieldCard, ev)?.source ?? '').not.toMatch(/narrowed/);
    const set = ev.fieldSettings.find((f) => f.key === 'springForce')!.value;
    expect(failingAt(set * 0.95)).toEqual([]);
    expect(failingAt(set * 1.05)).toEqual([]);
  });

  const table: SheetEvaluation['tables'][number] = {
    id: 'spring-setting',
    title: 't',
    columns: [
      { key: 'springForce', label: 'F', unit: 'N', dimension: 'force' },
      { key: 'springLength', label: 'L', unit: 'm', dimension: 'length' },
    ],
    // k = 40 N/mm, free length 250 mm.
    rows: [
      { springForce: 1000, springLength: 0.225 },
      { springForce: 1400, springLength: 0.215 },
    ],
  };
  const band: SettingBand = {
    tableId: 'spring-setting',
    set: 1200,
    failing: [['stop'], ['p·v']],
    low: 1195,
    high: 1230,
    lowLimitedBy: ['Stopping distance at the load ≤ allowed'],
    highLimitedBy: null,
  };
  const ev = {
    checks: [],
    tables: [table],
    settingBands: [band],
    fieldSettings: [
      {
        key: 'springLength',
        label: 'Main spring length as set',
        value: 0.22,
        unit: 'm',
        dimension: 'length' as const,
        tolerance: SPRING_LENGTH,
      },
    ],
  };

  it('reads a length through the table: ±0.5 mm is ±20 N on a 40 N/mm spring', () => {
    const said = toleranceBeyondBand(ev, table, undefined, 'SI');
    expect(said).toEqual([
      'Main spring length as set ± 0.5 mm would span a spring force of 1180 N … 1220 N, past ' +
        'the band: the field card and the records hold it to −0.5 mm / +0 mm (219.5 mm … 220.0 mm).',
    ]);
  });

  it('says nothing where checks already fail at the set value, or the tolerance stays inside', () => {
    const failing = { ...ev, checks: [{ pass: false } as SheetEvaluation['checks'][number]] };
    expect(toleranceBeyondBand(failing, table, undefined, 'SI')).toEqual([]);
    expect(bandedTolerance(failing.fieldSettings[0]!, undefined, failing)).toBe(SPRING_LENGTH);
    const wide = { ...ev, settingBands: [{ ...band, low: 1150, high: 1250 }] };
    expect(toleranceBeyondBand(wide, table, undefined, 'SI')).toEqual([]);
    expect(bandedTolerance(wide.fieldSettings[0]!, undefined, wide)).toBe(SPRING_LENGTH);
  });
});
