import fc from 'fast-check';
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
    // 0.5 mm = 0.019685 in: to three figures 0.0197 would print it wider; cut down to 0.0196.
    expect(toleranceText(SPRING_LENGTH, 'length', 'US')).toBe('± 0.0196 in');
  });

  it("with the setting's key, prints each side to the step a fitter reads it to, never wider", () => {
    const abs = (mm: number) => ({
      ...SPRING_LENGTH,
      band: { kind: 'absolute' as const, minus: mm / 1000, plus: mm / 1000 },
    });
    // A stack length read with a caliper to 0.01 mm: ± 0.104 mm (2.5 mm lead over 15°) is ± 0.1.
    expect(toleranceText(abs(0.10417), 'length', 'SI', 'a.setLength')).toBe('± 0.1 mm');
    expect(toleranceText(abs(0.16667), 'length', 'SI', 'equaliserSetLength')).toBe('± 0.16 mm');
    // A spring length read to 0.1 mm; in inches to 0.001 in, cut back (0.0197 → 0.019).
    expect(toleranceText(SPRING_LENGTH, 'length', 'SI', 'springLength')).toBe('± 0.5 mm');
    expect(toleranceText(SPRING_LENGTH, 'length', 'US', 'springLength')).toBe('± 0.019 in');
    // A side smaller than one reading step keeps its figures rather than print 0.
    expect(toleranceText(abs(0.004), 'length', 'SI', 'shoeClearance')).toBe('± 0.004 mm');
    // Without a reading step, three figures, never wider: 20 N = 4.496 lbf prints 4.49.
    expect(
      toleranceText(
        { ...SPRING_FORCE, band: { kind: 'absolute', minus: 30, plus: 20 } },
        'force',
        'US',
      ),
    ).toBe('−6.74 lbf / +4.49 lbf');
    // A force has no reading step: as before.
    expect(toleranceText(SPRING_FORCE, 'force', 'SI', 'springForce')).toBe('± 5 %');
  });

  it('a side cut back to the reading step is never wider than the band (any side, SI and US)', () => {
    fc.assert(
      fc.property(
        // 0.05 mm and up: a band a feeler gauge or a caliper can read.
        fc.double({ min: 5e-5, max: 5e-3, noNaN: true }),
        fc.constantFrom('springLength', 'a.setLength', 'shoeClearance', 'workingStroke'),
        fc.constantFrom<'SI' | 'US'>('SI', 'US'),
        (side, key, system) => {
          const t = {
            ...SPRING_LENGTH,
            band: { kind: 'absolute' as const, minus: side, plus: side },
          };
          const text = toleranceText(t, 'length', system, key);
          const printed = Number(/± ([\d.]+)/.exec(text)![1]);
          const exact = system === 'SI' ? side * 1000 : side / 0.0254;
          expect(printed).toBeLessThanOrEqual(exact * (1 + 1e-9));
        },
      ),
    );
  });
});
