import { describe, expect, it } from 'vitest';
import { securingCaution, sheetTypes } from '@holdfast/calc';
import { cautionLines } from './caution.js';

describe('cautions by sheet type', () => {
  it('every sheet type defers to the standard and the maker, and names how to hold the load', () => {
    for (const sheet of sheetTypes) {
      const lines = cautionLines(sheet.id);
      expect(lines).toHaveLength(7);
      expect(lines[1]).toContain("the brake maker's data, local codes and licensed practice");
      // One wording of how the load is secured: the evaluation's cautions start from it too.
      expect(lines[2]!.startsWith(securingCaution(sheet.id))).toBe(true);
      expect(lines.join(' ')).toContain('Adjust one brake at a time');
    }
  });

  it('a hoist: nothing on the hook, drum locked', () => {
    const line = cautionLines('hoist-shoe-brake')[2];
    expect(line).toContain('Never work under a suspended load');
    expect(line).toContain('lock the drum before brake work; nothing on the hook');
  });

  it('a travel drive: rail clamps and wind, no hook', () => {
    const line = cautionLines('travel-shoe-brake')[2];
    expect(line).toContain('rail clamps or wedges');
    expect(line).toContain('wind or a slope');
    expect(line).not.toContain('hook');
  });

  it('a drive: the loaded incline runs back, no hook', () => {
    const text = cautionLines('drive-shoe-brake').join(' ');
    expect(text).toContain('runs back when its brake opens');
    expect(text).toContain('make the drive unable to turn');
    expect(text).not.toContain('suspended');
  });

  it('a caliper: the disc and its release unit, every kind of load named', () => {
    const text = cautionLines('caliper-disc-brake').join(' ');
    expect(text).toContain('suspended load or on a drive that can run back');
    expect(text).toContain('lock the disc');
    expect(text).toContain('separately, the release unit supply');
    expect(text).not.toContain('thruster');
  });
});
