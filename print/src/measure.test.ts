import { beforeAll, describe, expect, it } from 'vitest';
import { registerPdfFonts } from './fonts.js';
import { TextMeasure } from './measure.js';

describe('TextMeasure (the PDF fonts themselves)', () => {
  let m: TextMeasure;
  beforeAll(async () => {
    registerPdfFonts();
    m = await TextMeasure.load();
  }, 60_000);

  it('line height follows the font metrics: Inter about 1.21 em, JetBrains Mono 1.32 em', () => {
    expect(m.lineHeight({ fontSize: 10 })).toBeCloseTo(12.1, 1);
    expect(m.lineHeight({ fontSize: 10, mono: true })).toBeCloseTo(13.2, 1);
  });

  it('mono characters share one advance; proportional ones do not', () => {
    const mono = { fontSize: 10, mono: true };
    expect(m.width('iiii', mono)).toBeCloseTo(m.width('MMMM', mono), 6);
    expect(m.width('MMMM', { fontSize: 10 })).toBeGreaterThan(m.width('iiii', { fontSize: 10 }));
    expect(m.width('MMMM', { fontSize: 10, weight: 700 })).toBeGreaterThan(
      m.width('MMMM', { fontSize: 10 }),
    );
  });

  it('measures symbols from the fallback fonts rather than as missing glyphs', () => {
    const style = { fontSize: 10 };
    // ≤ and √ are not in Inter's latin subset; a missing glyph would count a full em.
    expect(m.width('≤', style)).toBeGreaterThan(0);
    expect(m.width('≤', style)).toBeLessThan(10);
    expect(m.width('μ', style)).toBeLessThan(10);
  });

  it('wraps at spaces, cuts words wider than the line, and keeps explicit newlines', () => {
    const style = { fontSize: 10 };
    const word = m.width('brake', style);
    const space = m.width(' ', style);
    expect(m.lines('brake brake', 2 * word + space + 0.01, style)).toBe(1);
    expect(m.lines('brake brake', 2 * word + space - 0.01, style)).toBe(2);
    expect(m.lines('x'.repeat(40), m.width('x'.repeat(10), style) + 0.01, style)).toBe(4);
    expect(m.lines('a\nb\nc', 500, style)).toBe(3);
    expect(m.height('a\nb', 500, style)).toBeCloseTo(2 * m.lineHeight(style), 9);
  });
});
