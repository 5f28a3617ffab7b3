import { describe, expect, it } from 'vitest';
import { toleranceText } from '@holdfast/calc';
import { targetText } from './target-text.js';

describe('printed field-record texts', () => {
  it('a target prints to the step the fitter sets it by, as on the field card', () => {
    // Spring length is read with a steel rule to 0.5 mm (calc SETTING_PRECISION, common practice).
    const spring = { settingKey: 'springLength', dimension: 'length' };
    expect(targetText({ ...spring, target: 0.2227 }, 'SI')).toBe('222.5 mm');
    expect(targetText({ ...spring, target: null }, 'SI')).toBe('—');
    // A setting with no rule of its own prints by its dimension (lengths to 0.01 mm).
    expect(targetText({ settingKey: 'other', dimension: 'length', target: 0.2227 }, 'SI')).toBe(
      '222.7 mm',
    );
  });

  it('a tolerance band prints as a difference in the display unit', () => {
    const abs = { band: { kind: 'absolute', minus: 5e-4, plus: 5e-4 } } as never;
    expect(toleranceText(abs, 'length', 'SI')).toBe('± 0.5 mm');
    const rel = { band: { kind: 'relative', minus: 0, plus: 0.05 } } as never;
    expect(toleranceText(rel, 'length', 'SI')).toBe('−0 % / +5 %');
    expect(toleranceText(null, 'length', 'SI')).toBe('—');
  });
});
