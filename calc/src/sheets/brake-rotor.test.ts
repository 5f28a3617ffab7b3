import { describe, expect, it } from 'vitest';
import { SHEET_TYPE_IDS } from '../ids.js';
import { getCriteriaSet } from '../criteria/lookup.js';
import { rotorOf } from './brake-rotor.js';
import { demoInputs, getSheetType } from './registry.js';

describe('rotorOf', () => {
  it('only the caliper disc brake acts on a disc; every other sheet type on a drum', () => {
    for (const id of SHEET_TYPE_IDS) {
      expect(rotorOf(id), id).toBe(id === 'caliper-disc-brake' ? 'disc' : 'drum');
    }
    expect(SHEET_TYPE_IDS).toContain('caliper-disc-brake');
  });
});

describe('a caliper sheet speaks of its disc and pads', () => {
  it('no step, check, chart, table, setting or result of the demo caliper names a drum, lining or shoe', () => {
    const sheet = getSheetType('caliper-disc-brake')!;
    const r = sheet.evaluate(demoInputs(sheet), getCriteriaSet('general-industry')!);
    // Sources and references are left out: they cite general relations ("rope drum radius",
    // "lining duty") and the caution's "lock the drum" is the hoist's rope drum.
    const words = [
      ...r.derivation.map((s) => s.label),
      ...r.checks.map((c) => c.label),
      ...r.charts.flatMap((c) => [
        c.title,
        c.xLabel,
        c.yLabel,
        ...c.series.map((s) => s.name),
        ...(c.referenceLines ?? []).map((l) => l.label),
      ]),
      ...r.tables.flatMap((t) => [t.title, ...t.columns.map((c) => c.label)]),
      ...r.fieldSettings.map((f) => f.label),
      ...r.results.map((x) => x.label),
    ];
    expect(words.length).toBeGreaterThan(100);
    expect(words.filter((w) => /drum|lining|shoe/i.test(w))).toEqual([]);
  });

  it('its inputs name its release unit, not a thruster (the shoe sheets keep theirs)', () => {
    const text = (id: string) =>
      getSheetType(id)!
        .fields.flatMap((f) => [f.label, f.help ?? ''])
        .join('\n');
    expect(text('caliper-disc-brake')).not.toMatch(/thruster/i);
    expect(text('caliper-disc-brake')).toContain('Brake set delay of the release unit');
    expect(text('hoist-shoe-brake')).toContain("Brake set delay at the thruster's coldest oil");
  });
});
