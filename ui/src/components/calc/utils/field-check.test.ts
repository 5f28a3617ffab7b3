import { describe, expect, it } from 'vitest';
import { getSheetType, type FieldDefinition } from '@holdfast/calc';
import { checkField, fieldMessages } from './field-check';
import { unitLabel } from './units';

const angle: FieldDefinition = {
  key: 'wrap',
  section: 's',
  label: 'Wrap angle',
  symbol: 'θ',
  kind: 'quantity',
  dimension: 'angle',
  unitSI: 'deg',
  unitUS: 'deg',
  demo: { value: 90, unit: 'deg' },
  required: true,
  min: 0,
  max: (170 * Math.PI) / 180,
};
const ratio: FieldDefinition = {
  key: 'ratio',
  section: 's',
  label: 'Lever ratio',
  symbol: 'i',
  kind: 'number',
  dimension: 'dimensionless',
  demo: 4,
  required: true,
  min: 1,
  max: 20,
};

describe('checkField', () => {
  it('speaks bounds in the unit the engineer typed, to 4 significant figures', () => {
    const deg = unitLabel('angle', 'deg');
    expect(checkField(angle, { value: 200, unit: 'deg' }, 'point')).toBe(
      `Must be at most 170${deg}.`,
    );
    expect(checkField(angle, { value: -5, unit: 'deg' }, 'point')).toBe(
      `Must be at least 0${deg}.`,
    );
    expect(checkField(angle, { value: 120, unit: 'deg' }, 'point')).toBeNull();
  });

  it('plain numbers: range without a unit, the comma in the user format', () => {
    expect(checkField(ratio, 25, 'point')).toBe('Must be at most 20.');
    expect(checkField(ratio, 2.5, 'point')).toBeNull();
    expect(checkField(ratio, '0,5', 'comma')).toBe('Must be at least 1.');
    expect(checkField(ratio, '2,5', 'point')).toMatch(/^Use a point for decimals, e\.g\. 2\.5\./);
    expect(checkField(ratio, '', 'point')).toBe('Required: enter a value.');
    expect(checkField(ratio, '3 kN', 'point')).toMatch(/plain number/);
  });

  it('whole numbers refuse fractions', () => {
    expect(checkField({ ...ratio, kind: 'integer' }, 2.5, 'point')).toBe('Enter a whole number.');
  });
});

describe('fieldMessages on a real sheet type', () => {
  it('replaces the core’s SI message with the field’s own, and keeps other core messages', () => {
    const hoist = getSheetType('hoist-shoe-brake')!;
    const field = hoist.fields.find((f) => f.kind === 'quantity' && f.max !== undefined)!;
    const unit = field.unitSI!;
    const inputs = { [field.key]: { value: 1e12, unit } };
    const messages = fieldMessages(
      hoist.fields,
      inputs,
      { [field.key]: 'must be at most 123.456789 SI', other: 'core says no' },
      'point',
    );
    expect(messages[field.key]).toMatch(/^Must be at most [\d.]+(×10[⁰¹²³⁴⁵⁶⁷⁸⁹]+)? /);
    expect(messages[field.key]).not.toMatch(/\d{6,}/);
    expect(messages.other).toBe('core says no');
  });
});
