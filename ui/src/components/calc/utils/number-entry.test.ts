import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { messageNumber, readNumber, sameNumberText, writeNumber } from './number-entry';

const seed = process.env.FC_SEED === 'random' ? undefined : 20261203;

/** What a field holds after each prefix of `typed`, as a user types it key by key. */
function keyByKey(typed: string, format: 'point' | 'comma') {
  return [...typed].map((_, k) => readNumber(typed.slice(0, k + 1), format));
}

describe('readNumber', () => {
  it('reads decimals typed key by key without losing the point (2.5 is never 25)', () => {
    const steps = keyByKey('2.5', 'point');
    expect(steps.map((s) => (s.kind === 'number' ? s.value : s.kind))).toEqual([2, 2, 2.5]);
    const eff = keyByKey('0.85', 'point').at(-1);
    expect(eff).toEqual({ kind: 'number', value: 0.85, unitText: '' });
  });

  it('takes steps on the way to a number as incomplete, not as another number', () => {
    for (const t of ['-', '+', '.', '-.', '1e', '1e-', '2.5E+', ','])
      expect(readNumber(t, 'point').kind, t).toMatch(/incomplete|invalid/);
    expect(readNumber('-', 'point').kind).toBe('incomplete');
    expect(readNumber('1.5e-', 'comma').kind).toBe('incomplete');
  });

  it('reads negatives, exponents and a unit after the number', () => {
    expect(readNumber('-3.5', 'point')).toEqual({ kind: 'number', value: -3.5, unitText: '' });
    expect(readNumber('1.2e-3', 'point')).toEqual({ kind: 'number', value: 0.0012, unitText: '' });
    expect(readNumber('12 kN', 'point')).toEqual({ kind: 'number', value: 12, unitText: 'kN' });
    expect(readNumber('170°', 'point')).toEqual({ kind: 'number', value: 170, unitText: '°' });
    expect(readNumber('  ', 'point')).toEqual({ kind: 'empty' });
  });

  it('reads a decimal comma only when the number format says so', () => {
    expect(readNumber('0,85', 'comma')).toEqual({ kind: 'number', value: 0.85, unitText: '' });
    expect(readNumber('1,5e3 N', 'comma')).toEqual({ kind: 'number', value: 1500, unitText: 'N' });
    // A point still reads as a decimal point in the comma format (people type both).
    expect(readNumber('2.5', 'comma')).toEqual({ kind: 'number', value: 2.5, unitText: '' });
    const refused = readNumber('0,85', 'point');
    expect(refused.kind).toBe('invalid');
    expect(refused.kind === 'invalid' && refused.message).toMatch(/point for decimals, e.g. 0\.85/);
    expect(refused.kind === 'invalid' && refused.message).not.toMatch(/unit/);
  });

  it('names thousands separators and spaces inside numbers instead of guessing', () => {
    expect(readNumber('1.234,5', 'comma')).toMatchObject({ kind: 'invalid' });
    expect(readNumber('12 000', 'point')).toMatchObject({
      kind: 'invalid',
      message: expect.stringMatching(/spaces between digits/),
    });
    expect(readNumber('abc', 'point')).toMatchObject({ kind: 'invalid' });
  });

  it('every prefix of a typed number is empty, incomplete or a number; the end is the number', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e6, max: 1e6, noNaN: true }),
        fc.constantFrom<'point' | 'comma'>('point', 'comma'),
        (x, format) => {
          const typed = writeNumber(x, format);
          const steps = keyByKey(typed, format);
          for (const s of steps) expect(s.kind).not.toBe('invalid');
          const last = steps.at(-1)!;
          expect(last.kind).toBe('number');
          expect(last.kind === 'number' && last.value).toBe(Number(x.toPrecision(12)));
        },
      ),
      { seed, numRuns: 300 },
    );
  });
});

describe('writing numbers back', () => {
  it('writes in the user format and keeps typed text that means the same number', () => {
    expect(writeNumber(0.85, 'comma')).toBe('0,85');
    expect(writeNumber(0.1 + 0.2, 'point')).toBe('0.3');
    expect(sameNumberText('2.', '2', 'point')).toBe(true);
    expect(sameNumberText('1e3', '1000', 'point')).toBe(true);
    expect(sameNumberText('2,50', '2,5', 'comma')).toBe(true);
    expect(sameNumberText('25', '2.5', 'point')).toBe(false);
  });

  it('prints message figures to at most 4 significant figures with a real minus', () => {
    expect(messageNumber(170.00000000000003)).toBe('170');
    expect(messageNumber(2.9670597283903604)).toBe('2.967');
    expect(messageNumber(-0.0016666666666666668)).toBe('−0.001667');
    expect(messageNumber(12345.678)).toBe('12350');
    expect(messageNumber(0.5, 'comma')).toBe('0,5');
    expect(messageNumber(2.5e-5)).toBe('2.5×10⁻⁵');
  });
});
