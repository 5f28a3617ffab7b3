import { describe, expect, it } from 'vitest';
import { ALL_CASES } from './all-cases.js';
import { checkCase, FAMILIES } from './case.js';

describe('verification cases', () => {
  it.each(ALL_CASES.map((c) => [c.id, c] as const))('%s', (_id, c) => {
    const outcome = checkCase(c);
    expect(outcome.error, outcome.error).toBeUndefined();
    for (const r of outcome.rows) {
      expect(
        r.pass,
        `${r.label}: expected ${r.expected} ${r.unit} (${r.tolerance}), got ${r.got}`,
      ).toBe(true);
    }
  });

  it('has unique ids, a source and a tolerance note on every case', () => {
    const ids = ALL_CASES.map((c) => c.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const c of ALL_CASES) {
      expect(c.source.length, c.id).toBeGreaterThan(10);
      expect(c.toleranceNote.length, c.id).toBeGreaterThan(5);
      expect(c.expected.length, c.id).toBeGreaterThan(0);
      for (const x of c.expected)
        expect(x.rel !== undefined || x.abs !== undefined, `${c.id} ${x.key}`).toBe(true);
    }
  });

  it('covers every family with at least 40 cases in all', () => {
    expect(ALL_CASES.length).toBeGreaterThanOrEqual(40);
    const present = new Set(ALL_CASES.map((c) => c.family));
    expect(FAMILIES.filter((f) => !present.has(f))).toEqual([]);
  });
});
