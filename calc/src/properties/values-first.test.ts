import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isCalcInputError } from '../core/errors.js';
import type { SheetEvaluation, SheetInputs, SheetTypeDefinition } from '../core/types.js';
import { CRITERIA_SETS } from '../criteria/sets.js';
import { sheetTypes } from '../sheets/registry.js';
import { sheetInputsArb } from './sheet-arbitraries.js';

/** What the live editor and the sweeps read of an evaluation: values, verdicts and margins. */
function valuesOf(e: SheetEvaluation) {
  return {
    results: e.results.map((r) => [r.key, r.value, r.unit]),
    checks: e.checks.map((c) => [c.id, c.value, c.limit, c.utilisation, c.pass]),
    fieldSettings: e.fieldSettings.map((f) => [f.key, f.value]),
    warnings: e.warnings,
    pass: e.pass,
  };
}

function evaluateOrNull(sheet: SheetTypeDefinition, inputs: SheetInputs, k: number) {
  try {
    return sheet.evaluate(inputs, CRITERIA_SETS[k % CRITERIA_SETS.length]!); // k mod length
  } catch (err) {
    if (isCalcInputError(err)) return null;
    throw err;
  }
}

describe.each(sheetTypes.map((s) => [s.id, s] as const))('sheet %s: values first', (_id, sheet) => {
  it('gives the values and verdicts of the full evaluation; its derivation read later is the same text', () => {
    fc.assert(
      fc.property(sheetInputsArb(sheet, 'near'), fc.nat(), (inputs, k) => {
        // Full: every step, substituted line and check message written at once (saving, printing).
        const full = evaluateOrNull(sheet, inputs, k);
        const fullJson = full && JSON.stringify(full);
        // Values first: nothing printed is read.
        const live = evaluateOrNull(sheet, inputs, k);
        if (full === null || live === null) {
          expect(live).toBe(full);
          return;
        }
        expect(valuesOf(live)).toEqual(valuesOf(full));
        // Read afterwards, the derivation and messages are what the full evaluation wrote.
        expect(JSON.stringify(live)).toBe(fullJson);
      }),
      { numRuns: 60 },
    );
  });
});
