import { describe, expect, it } from 'vitest';
import { criterionText } from './criterion-text.js';
import { CRITERIA_SETS } from './sets.js';
import { criterionSpec } from './catalogue.js';

describe('criterionText', () => {
  it('prints a value stored in an SI unit in the unit system, to its precision', () => {
    expect(criterionText(2.1e6, 'Pa m/s', 'SI').text).toBe('2.10 MPa·m/s');
    expect(criterionText(0.7e6, 'Pa', 'SI')).toEqual({
      number: '0.700',
      unit: 'MPa',
      text: '0.700 MPa',
    });
  });

  it('prints a value stored in another unit as stored: the travel rule is 0.1 min, not 0.1 s', () => {
    expect(criterionText(0.1, 'min', 'SI')).toEqual({
      number: '0.1',
      unit: 'min',
      text: '0.1 min',
    });
    expect(criterionText(0.1, 'min', 'US').text).toBe('0.1 min');
  });

  it('prints a plain ratio bare', () => {
    expect(criterionText(1.25, '', 'SI').text).toBe('1.25');
  });

  it('prints every shipped value with the unit its catalogue entry declares', () => {
    for (const set of CRITERIA_SETS) {
      for (const v of set.values) {
        const spec = criterionSpec(v.key)!;
        const t = criterionText(v.value, v.unit, 'SI');
        if (spec.unit === 'min') expect(t.unit, v.key).toBe('min');
        expect(t.text, v.key).not.toMatch(/NaN|undefined/);
      }
    }
  });
});
