import { describe, expect, it } from 'vitest';
import { CRITERIA_SETS } from './sets.js';
import { criterion, getCriteriaSet } from './lookup.js';
import { LININGS } from './linings.js';
import { CalcInputError } from '../core/errors.js';

describe('criteria sets', () => {
  it('ship general-industry, crane-hoist and travel-drive, each value with a source and confidence', () => {
    expect(CRITERIA_SETS.map((s) => s.id)).toEqual([
      'general-industry',
      'crane-hoist',
      'travel-drive',
    ]);
    for (const s of CRITERIA_SETS) {
      expect(s.description).toMatch(/governing standard/);
      for (const v of s.values) {
        expect(v.source.length).toBeGreaterThan(10);
        expect(['published', 'secondary', 'common practice', 'memory']).toContain(v.confidence);
        expect(Number.isFinite(v.value)).toBe(true);
      }
    }
  });
  it('crane-hoist carries 125 % / 100 % / 100 % from 29 CFR 1910.179(f)', () => {
    const s = getCriteriaSet('crane-hoist')!;
    expect(criterion(s, 'torqueFactorSingle').value).toBe(1.25);
    expect(criterion(s, 'torqueFactorMechanical').value).toBe(1);
    expect(criterion(s, 'torqueFactorEachOfTwo').value).toBe(1);
    expect(criterion(s, 'torqueFactorSingle').source).toMatch(/1910\.179/);
    expect(criterion(s, 'torqueFactorSingle').source).toMatch(/4898/);
  });
  it('travel-drive carries the 10 %-of-speed rule', () => {
    expect(criterion(getCriteriaSet('travel-drive')!, 'travelStopFraction').value).toBe(0.1);
  });
  it('a missing value is a field error', () => {
    expect(() =>
      criterion({ id: 'x', version: 1, name: 'x', description: '', values: [] }, 'pvLimit'),
    ).toThrow(CalcInputError);
  });
  it('lining table rows carry the Tribology Handbook source', () => {
    expect(LININGS.length).toBe(7);
    for (const l of LININGS) expect(l.source).toMatch(/Table 8\.10/);
  });
});
