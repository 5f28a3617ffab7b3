import { describe, expect, it } from 'vitest';
import type { CriteriaSet } from '../core/types.js';
import { demoInputs, getSheetType, sheetTypes } from '../sheets/registry.js';
import { CRITERIA_SETS } from './sets.js';
import { getCriteriaSet } from './lookup.js';

const general = getCriteriaSet('general-industry')!;

function evaluate(id: string, criteria: CriteriaSet, change: Record<string, unknown> = {}) {
  const sheet = getSheetType(id)!;
  return sheet.evaluate({ ...demoInputs(sheet), ...(change as never) }, criteria);
}

describe('criteriaUsed: the criteria values an evaluation read', () => {
  it('names the torque factor of the brake arrangement chosen, and only that one', () => {
    const two = evaluate('hoist-shoe-brake', general, { brakeArrangement: 'two' });
    expect(two.criteriaUsed).toContain('torqueFactorEachOfTwo');
    expect(two.criteriaUsed).not.toContain('torqueFactorSingle');
    const one = evaluate('hoist-shoe-brake', general, { brakeArrangement: 'single' });
    expect(one.criteriaUsed).toContain('torqueFactorSingle');
    expect(one.criteriaUsed).not.toContain('torqueFactorEachOfTwo');
  });

  it('lists the keys in the order of the set', () => {
    for (const sheet of sheetTypes) {
      const used = sheet.evaluate(demoInputs(sheet), general).criteriaUsed!;
      const order = general.values.map((v) => v.key).filter((k) => used.includes(k));
      expect(used).toEqual(order);
    }
  });

  it('records a value read only when the set carries it (σOM at flat falls back to its default)', () => {
    const plain = evaluate('disc-spring-stack', general);
    expect(plain.criteriaUsed).toEqual([]);
    const withLimit: CriteriaSet = {
      ...general,
      values: [
        ...general.values,
        {
          key: 'discSpring.sigmaOMFlatMax',
          label: 'σOM at flat',
          value: 1.6e9,
          unit: 'Pa',
          source: 'test value',
          confidence: 'memory',
        },
      ],
    };
    expect(evaluate('disc-spring-stack', withLimit).criteriaUsed).toEqual([
      'discSpring.sigmaOMFlatMax',
    ]);
  });

  it('leaves nothing off: the set cut to the values listed gives the same evaluation', () => {
    for (const sheet of sheetTypes) {
      for (const set of CRITERIA_SETS) {
        const full = sheet.evaluate(demoInputs(sheet), set);
        const cut: CriteriaSet = {
          ...set,
          values: set.values.filter((v) => full.criteriaUsed!.includes(v.key)),
        };
        expect(JSON.stringify(sheet.evaluate(demoInputs(sheet), cut))).toBe(JSON.stringify(full));
      }
    }
  });

  it('does not carry one evaluation’s reads into the next', () => {
    evaluate('travel-shoe-brake', general);
    expect(evaluate('disc-spring-stack', general).criteriaUsed).toEqual([]);
  });
});
