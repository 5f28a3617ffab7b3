import { createHash } from 'node:crypto';
import { readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isCalcInputError } from '../../core/errors.js';
import type { SheetInputs, SheetTypeDefinition } from '../../core/types.js';
import { CRITERIA_SETS } from '../../criteria/sets.js';
import { sheetInputsArb } from '../../properties/sheet-arbitraries.js';
import { demoInputs, sheetTypes } from '../registry.js';

// Every evaluation serialised as saving a revision does (JSON: every value, every substituted line,
// every check message), held to the output of the core before the values-first path existed, byte
// for byte. Regenerate only for an intended change of output: UPDATE_GOLDEN=1.
const FILE = fileURLToPath(new URL('./evaluations.golden.json', import.meta.url));
const VARIANTS = 40;

function serialise(sheet: SheetTypeDefinition, inputs: SheetInputs, setIndex: number): string {
  const criteria = CRITERIA_SETS[setIndex]!; // setIndex < CRITERIA_SETS.length
  try {
    return JSON.stringify(sheet.evaluate(inputs, criteria));
  } catch (err) {
    if (!isCalcInputError(err)) throw err;
    return JSON.stringify({ inputError: err.fields });
  }
}

/** Inputs near each sheet's demo values, fixed by seed: the same list on every run. */
function variants(sheet: SheetTypeDefinition): SheetInputs[] {
  return fc.sample(sheetInputsArb(sheet, 'near'), { seed: 14, numRuns: VARIANTS });
}

const sha256 = (text: string) => createHash('sha256').update(text).digest('hex');
const evaluated = new Map<string, number>();

function current(): Record<string, string> {
  const out: Record<string, string> = {};
  for (const sheet of sheetTypes) {
    // The demo against the first set is kept as text, for a readable diff; the rest as hashes.
    for (const [k] of CRITERIA_SETS.entries()) {
      const json = serialise(sheet, demoInputs(sheet), k);
      out[`${sheet.id} demo set${k}`] = k === 0 ? json : sha256(json);
    }
    for (const [i, inputs] of variants(sheet).entries()) {
      const k = i % CRITERIA_SETS.length;
      const json = serialise(sheet, inputs, k);
      if (!json.startsWith('{"inputError"'))
        evaluated.set(sheet.id, (evaluated.get(sheet.id) ?? 0) + 1);
      out[`${sheet.id} variant${i} set${k}`] = sha256(json);
    }
  }
  return out;
}

describe('every demo evaluation, byte for byte', () => {
  it('matches the golden file', () => {
    const now = current();
    if (process.env.UPDATE_GOLDEN === '1') writeFileSync(FILE, JSON.stringify(now, null, 2) + '\n');
    const golden = JSON.parse(readFileSync(FILE, 'utf8')) as Record<string, string>;
    expect(Object.keys(now)).toEqual(Object.keys(golden));
    // Coupled fields refuse many random inputs (that checks the error path too); enough evaluate.
    // (The travel sheet's masses are coupled too, unladen ≤ laden: 4 of its 40 evaluate.)
    for (const sheet of sheetTypes) expect(evaluated.get(sheet.id), sheet.id).toBeGreaterThan(3);
    for (const key of Object.keys(golden)) expect(now[key], key).toBe(golden[key]);
  });
});
