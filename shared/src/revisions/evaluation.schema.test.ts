import { describe, expect, it } from 'vitest';
import { sheetInputsSchema } from './evaluation.schema.js';

/** Where and why the schema refuses one input ('load: …'), or undefined when it is accepted. */
function problem(value: unknown): string | undefined {
  const r = sheetInputsSchema.safeParse({ load: value });
  if (r.success) return undefined;
  expect(r.error.issues).toHaveLength(1);
  const issue = r.error.issues[0]!;
  return `${issue.path.join('.')}: ${issue.message}`;
}

describe('typed inputs: what is accepted and why the rest is not', () => {
  it('accepts a value with its unit, a number, a choice and yes/no', () => {
    for (const v of [{ value: 9000, unit: 'kg' }, 4, 'two', true])
      expect(problem(v)).toBeUndefined();
  });

  it('says which part of a value with its unit is wrong', () => {
    expect(problem({ value: '9000', unit: 'kg' })).toMatch(
      /^load: "value" must be a finite number/,
    );
    expect(problem({ value: 9000 })).toMatch(/^load: "unit" must name a unit/);
    expect(problem({ value: 9000, unit: '' })).toBe('load.unit: must name a unit');
    expect(problem({ value: 9000, unit: 'kg', note: 'x' })).toBe(
      'load: a value with its unit has only "value" and "unit", not "note"',
    );
  });

  it('names the accepted shapes for anything else', () => {
    for (const v of [null, [9000], {}]) expect(problem(v)).toMatch(/^load: .*(must|value)/);
    expect(problem(null)).toMatch(
      /^load: must be a number, a choice, yes\/no, or a value with its unit/,
    );
  });
});
