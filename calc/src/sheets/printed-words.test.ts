import { describe, expect, it } from 'vitest';
import { demoInputs, getCriteriaSet, sheetTypes } from '../index.js';

/**
 * Every word a sheet prints comes out of its evaluation: labels, messages, notes, warnings. None
 * may carry a template placeholder ('{drum}') or an unfilled value ('undefined', 'NaN').
 */
describe('printed words of every demo sheet', () => {
  for (const sheet of sheetTypes) {
    it(`${sheet.id}: no placeholder or unfilled value`, () => {
      const r = sheet.evaluate(demoInputs(sheet), getCriteriaSet('general-industry')!);
      const texts = [
        ...r.checks.flatMap((c) => [c.label, c.message, c.source]),
        ...r.results.map((x) => x.label),
        ...r.derivation.flatMap((s) => [s.label, s.formula, s.substituted]),
        ...r.fieldSettings.flatMap((f) => [f.label, f.note ?? '']),
        ...r.warnings,
      ];
      const bad = texts.filter((t) => /[{}]|\bundefined\b|\bNaN\b/.test(t));
      expect(bad).toEqual([]);
    });
  }
});
