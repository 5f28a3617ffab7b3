import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CalcInputError } from '../core/errors.js';
import {
  CRITERION_SPECS,
  REQUIRED_CRITERIA,
  criteriaValueProblems,
  criterionSpec,
} from './catalogue.js';
import { criterion } from './lookup.js';
import { CRITERIA_SETS } from './sets.js';

const seed = process.env.FC_SEED === 'random' ? undefined : 20261203;

describe('criteria catalogue', () => {
  it('declares every shipped value, in its unit and inside its bounds', () => {
    for (const set of CRITERIA_SETS) {
      expect(criteriaValueProblems(set.values), set.id).toEqual([]);
      for (const v of set.values) expect(v.unit, v.key).toBe(criterionSpec(v.key)!.unit);
    }
  });

  it('every shipped set carries every required criterion', () => {
    for (const set of CRITERIA_SETS) {
      expect(
        REQUIRED_CRITERIA.filter((k) => !set.values.some((v) => v.key === k)),
        set.id,
      ).toEqual([]);
    }
  });

  it('refuses 1e308, −5 and 0 for the p·v limit, naming the path', () => {
    const pv = (value: number) => [{ key: 'pvLimit', value, unit: 'Pa m/s' }];
    for (const bad of [1e308, -5, 0, Number.NaN, Number.POSITIVE_INFINITY]) {
      const errors = criteriaValueProblems(pv(bad));
      expect(errors, String(bad)).toHaveLength(1);
      expect(errors[0]!.field).toBe('0.value');
    }
    expect(criteriaValueProblems(pv(2.1e6))).toEqual([]);
  });

  it('refuses unknown keys, repeats and a foreign unit', () => {
    const errors = criteriaValueProblems([
      { key: 'pvLimit', value: 2e6, unit: 'psi ft/min' },
      { key: 'bogus', value: 1, unit: '' },
      { key: 'pvLimit', value: 2e6, unit: '' },
    ]);
    expect(errors.map((e) => e.field)).toEqual(['0.unit', '1.key', '2.key']);
  });

  it('accepts a value inside the bounds and refuses one outside, for every criterion', () => {
    for (const spec of CRITERION_SPECS) {
      fc.assert(
        fc.property(fc.double({ noNaN: true }), (value) => {
          const inside =
            (spec.minExclusive ? value > spec.min : value >= spec.min) && value <= spec.max;
          const errors = criteriaValueProblems([{ key: spec.key, value, unit: spec.unit }]);
          expect(errors.length === 0).toBe(inside);
        }),
        { seed, numRuns: 300 },
      );
    }
  });

  it('criterion() refuses a stored value outside its bounds as a field error', () => {
    const set = {
      id: 'x',
      version: 2,
      name: 'x',
      description: '',
      values: [
        {
          key: 'pvLimit',
          label: 'p·v',
          value: -5,
          unit: 'Pa m/s',
          source: 's',
          confidence: 'memory' as const,
        },
      ],
    };
    expect(() => criterion(set, 'pvLimit')).toThrow(CalcInputError);
    try {
      criterion(set, 'pvLimit');
    } catch (e) {
      expect((e as CalcInputError).fields[0]!.field).toBe('criteria.pvLimit');
    }
  });
});
