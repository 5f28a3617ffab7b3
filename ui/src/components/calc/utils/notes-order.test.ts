import { describe, expect, it } from 'vitest';
import { demoInputs, getCriteriaSet, getSheetType } from '@holdfast/calc';
import { notesFirst } from './notes-order';

describe('notesFirst', () => {
  it("puts the calculation's own notes before the cautions, keeping every line", () => {
    const sheet = getSheetType('travel-shoe-brake')!;
    const { warnings } = sheet.evaluate(demoInputs(sheet), getCriteriaSet('general-industry')!);
    const ordered = notesFirst(warnings);
    expect([...ordered].sort()).toEqual([...warnings].sort());
    expect(warnings[0]).toMatch(/^These results support/);
    expect(ordered[0]).not.toMatch(/^These results support/);
    expect(ordered[0]).toMatch(/re-adjustment/);
    expect(ordered.at(-1)).toMatch(/rail clamps/);
  });

  it('leaves a list without cautions as it was', () => {
    expect(notesFirst(['b', 'a'])).toEqual(['b', 'a']);
  });
});
