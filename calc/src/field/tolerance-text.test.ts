import { describe, expect, it } from 'vitest';
import { toleranceText } from './tolerance-text.js';
import { AIR_GAP, BACK_OFF_ANGLE, SPRING_FORCE, SPRING_LENGTH } from './tolerances.js';

describe('toleranceText', () => {
  it('writes each kind of band', () => {
    expect(toleranceText(SPRING_LENGTH, 'length')).toBe('± 0.5 mm');
    expect(toleranceText(AIR_GAP, 'length')).toBe('−0.1 mm / +0.2 mm');
    expect(toleranceText(SPRING_FORCE, 'force')).toBe('± 5 %');
    expect(toleranceText(BACK_OFF_ANGLE, 'angle')).toMatch(/^−0 ?° \/ \+15 ?°$/);
    expect(toleranceText({ ...SPRING_LENGTH, band: { kind: 'atLeast' } }, 'length')).toBe(
      '≥ target',
    );
    expect(toleranceText(null, 'length')).toBe('—');
  });

  it('converts an absolute band to the US display unit', () => {
    expect(toleranceText(SPRING_LENGTH, 'length', 'US')).toBe('± 0.0197 in');
  });
});
