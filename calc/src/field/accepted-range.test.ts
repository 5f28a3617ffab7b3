import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Dimension } from '../core/types.js';
import { toDisplay, type UnitSystem } from '../units/display.js';
import { toSI } from '../units/conversion.js';
import { acceptedRange } from './accepted-range.js';
import { evaluateTolerance } from './evaluate-tolerance.js';
import type { FieldTolerance } from './tolerance-types.js';
import * as T from './tolerances.js';

const absolute = (minus: number, plus: number): FieldTolerance => ({
  band: { kind: 'absolute', minus, plus },
  source: 'test',
  confidence: 'common practice',
});

describe('acceptedRange, cases worked by hand', () => {
  it('221.25 mm ± 0.5 mm: 220.75 to 221.75 mm, printed inward to 0.1 mm', () => {
    // To the nearest it would read 220.8 to 221.8 mm, and 221.8 mm is judged out.
    expect(acceptedRange(0.22125, T.SPRING_LENGTH, 'springLength', 'length')?.text).toBe(
      '220.8 to 221.7 mm',
    );
    expect(evaluateTolerance(0.22125, 0.2218, T.SPRING_LENGTH, 'length').status).toBe('out');
  });

  it('an end that falls on the reading step prints as it is', () => {
    expect(acceptedRange(0.2215, T.SPRING_LENGTH, 'springLength', 'length')?.text).toBe(
      '221.0 to 222.0 mm',
    );
    expect(acceptedRange(1150, absolute(30, 20), 'springForce', 'force')?.text).toBe(
      '1120 to 1170 N',
    );
  });

  it('a relative band: 30 mm stroke ± 10 % is 27.0 to 33.0 mm', () => {
    expect(acceptedRange(0.03, T.WORKING_STROKE, 'workingStroke', 'length')?.text).toBe(
      '27.0 to 33.0 mm',
    );
  });

  it('in US units the ends are in inches, inside the band', () => {
    // 220.75 mm = 8.69094 in, 221.75 mm = 8.73031 in; read to 0.001 in.
    expect(acceptedRange(0.22125, T.SPRING_LENGTH, 'springLength', 'length', 'US')?.text).toBe(
      '8.691 to 8.730 in',
    );
  });

  it('a band narrower than the reading step has no printable range', () => {
    // ± 0.004 mm around 1.205 mm: inward to 0.01 mm the ends would cross (1.21 to 1.20).
    expect(
      acceptedRange(0.001205, absolute(4e-6, 4e-6), 'shoeClearance', 'length'),
    ).toBeUndefined();
  });

  it('a one-sided tolerance or none has no range', () => {
    const atLeast: FieldTolerance = { ...T.SPRING_FORCE, band: { kind: 'atLeast' } };
    expect(acceptedRange(0.02, atLeast, 'reserveStroke', 'length')).toBeUndefined();
    expect(acceptedRange(0.02, undefined, 'reserveStroke', 'length')).toBeUndefined();
  });
});

describe('acceptedRange, invariants', () => {
  const cases: { key: string; dimension: Dimension; scale: number }[] = [
    { key: 'springLength', dimension: 'length', scale: 0.3 },
    { key: 'shoeClearance', dimension: 'length', scale: 0.003 },
    { key: 'springForce', dimension: 'force', scale: 20000 },
    { key: 'holderBackOff', dimension: 'angle', scale: 6 },
  ];

  it('both printed ends, typed back as a fitter would, are judged in, lower before upper', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...cases),
        fc.constantFrom<UnitSystem>('SI', 'US'),
        fc.double({ min: 0.05, max: 1, noNaN: true }),
        fc.double({ min: 0.002, max: 0.2, noNaN: true }),
        fc.double({ min: 0.002, max: 0.2, noNaN: true }),
        (c, system, at, minus, plus) => {
          const value = at * c.scale;
          const tolerance = absolute(minus * value, plus * value);
          const range = acceptedRange(value, tolerance, c.key, c.dimension, system);
          // A band narrower than the reading's step has no printable range.
          if (!range) return;
          const unit = toDisplay(value, c.dimension, system).unit;
          const typed = (text: string) => toSI(Number(text.replace('−', '-')), unit, c.dimension);
          for (const end of [range.lower, range.upper]) {
            expect(evaluateTolerance(value, typed(end), tolerance, c.dimension).status).toBe('in');
          }
          expect(typed(range.lower)).toBeLessThanOrEqual(typed(range.upper));
        },
      ),
    );
  });
});
