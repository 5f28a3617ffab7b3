import { describe, expect, it } from 'vitest';
import { getCriteriaSet } from '../criteria/lookup.js';
import { demoInputs, getSheetType } from './registry.js';
import { isSafetyCaution, SHEET_CAUTIONS } from './sheet-output.js';

const criteria = getCriteriaSet('general-industry')!;
const evaluate = (id: string) => {
  const sheet = getSheetType(id)!;
  return sheet.evaluate(demoInputs(sheet), criteria);
};

describe('the usual cautions an evaluation carries', () => {
  it.each([
    ['hoist-shoe-brake', 'hoist', /suspended load: land the load or lock the drum/],
    ['travel-shoe-brake', 'travel', /rail clamps or wedges, storm pins/],
    ['drive-shoe-brake', 'drive', /inclined conveyor under load runs back/],
    ['caliper-disc-brake', 'caliper', /lock the disc .* release unit supply/],
  ] as const)('%s: its own, first, each one a caution', (id, kind, words) => {
    const ev = evaluate(id);
    expect(ev.warnings.slice(0, 2)).toEqual(SHEET_CAUTIONS[kind]);
    expect(ev.warnings[1]).toMatch(words);
    for (const w of SHEET_CAUTIONS[kind]) expect(isSafetyCaution(w)).toBe(true);
  });

  it('only the hoist sheet speaks of a suspended load on its own', () => {
    expect(SHEET_CAUTIONS.travel.join(' ')).not.toMatch(/suspended|hook/);
    expect(SHEET_CAUTIONS.drive.join(' ')).not.toMatch(/suspended|hook/);
  });

  it('a calculation note is not a caution, so the printout still lists it', () => {
    const notes = evaluate('travel-shoe-brake').warnings.filter((w) => !isSafetyCaution(w));
    expect(notes.length).toBeGreaterThan(0);
    expect(notes.every((w) => !w.startsWith('These results support'))).toBe(true);
  });
});
