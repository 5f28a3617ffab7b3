import { demoInputs } from '../sheets/registry.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isCalcInputError } from '../core/errors.js';
import type { CriteriaSet, SheetInputs, SheetTypeDefinition } from '../core/types.js';
import { CRITERIA_SETS } from '../criteria/sets.js';
import { sheetTypes } from '../sheets/registry.js';
import { allNumbers, defaultsInUS, invalidValues, sheetInputsArb } from './sheet-arbitraries.js';

/** Every registered sheet type, evaluated against the first shipped criteria set. */
const SHEETS: readonly SheetTypeDefinition[] = sheetTypes;
const criteria: CriteriaSet = CRITERIA_SETS[0];

describe.each(SHEETS.map((s) => [s.id, s] as const))('sheet %s: properties', (_id, sheet) => {
  const keys = new Set(sheet.fields.map((f) => f.key));

  const finiteOrNamedError = (inputs: SheetInputs): boolean => {
    try {
      const e = sheet.evaluate(inputs, criteria);
      const bad = allNumbers(e).filter((v) => !Number.isFinite(v));
      if (bad.length > 0) expect(bad).toEqual([]);
      return true;
    } catch (err) {
      if (!isCalcInputError(err)) throw err;
      expect(err.fields.length).toBeGreaterThan(0);
      for (const f of err.fields) expect(keys.has(f.field), f.field).toBe(true);
      return false;
    }
  };

  it('never yields NaN or Infinity: any input inside the field bounds evaluates finite or fails with named fields', () => {
    fc.assert(
      fc.property(sheetInputsArb(sheet, 'full'), (inputs) => void finiteOrNamedError(inputs)),
      { numRuns: 300 },
    );
  }, 30_000);

  it('inputs near the defaults mostly evaluate, and always to finite numbers', () => {
    let evaluated = 0;
    fc.assert(
      fc.property(
        sheetInputsArb(sheet, 'near'),
        (inputs) => void (finiteOrNamedError(inputs) && evaluated++),
      ),
      { numRuns: 200 },
    );
    expect(evaluated).toBeGreaterThan(20);
  }, 30_000);

  it('the defaults evaluate and give the same results when entered in US customary units', () => {
    const si = sheet.evaluate(demoInputs(sheet), criteria);
    const us = sheet.evaluate(defaultsInUS(sheet), criteria);
    expect(us.results.length).toBe(si.results.length);
    si.results.forEach((r, i) => {
      const tol = 1e-9 * Math.max(1, Math.abs(r.value));
      expect(Math.abs(us.results[i].value - r.value), r.key).toBeLessThanOrEqual(tol);
    });
  }, 30_000);

  it('rejects every invalid input naming its field', () => {
    for (const f of sheet.fields) {
      for (const bad of invalidValues(f)) {
        let fields: string[] = [];
        try {
          sheet.evaluate({ ...demoInputs(sheet), [f.key]: bad }, criteria);
        } catch (err) {
          if (!isCalcInputError(err)) throw err;
          fields = err.fields.map((x) => x.field);
        }
        expect(fields, `${f.key} = ${JSON.stringify(bad)}`).toContain(f.key);
      }
    }
  }, 30_000);
});
