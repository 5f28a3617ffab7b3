import { Font } from '@react-pdf/renderer';
import { beforeAll, describe, expect, it } from 'vitest';
import { registerPdfFonts } from './fonts.js';
import { memoiseGlyphLayout } from './glyph-layout-cache.js';
import { TextMeasure } from './measure.js';

interface Run {
  glyphs: { id: number }[];
  positions: { xAdvance: number }[];
  advanceWidth: number;
}
type Shaper = { layout: (text: string, features?: unknown) => Run };

describe('memoised glyph layout', () => {
  let inter: Shaper;
  let first: Run;
  beforeAll(async () => {
    registerPdfFonts();
    await TextMeasure.load(); // loads every weight of both stacks
    inter = (Font.getFont({ fontFamily: 'Inter', fontWeight: 400 }) as unknown as { data: Shaper })
      .data;
    first = inter.layout('Brake torque at μ min');
    memoiseGlyphLayout();
  }, 60_000);

  it('shapes a string as fontkit does, the first time and from the cache', () => {
    const a = inter.layout('Brake torque at μ min');
    const b = inter.layout('Brake torque at μ min');
    for (const run of [a, b]) {
      expect(run.glyphs.map((g) => g.id)).toEqual(first.glyphs.map((g) => g.id));
      expect(run.positions.map((p) => p.xAdvance)).toEqual(first.positions.map((p) => p.xAdvance));
      expect(run.advanceWidth).toBeCloseTo(first.advanceWidth, 9);
    }
  });

  it('hands out a fresh glyph array, so a caller cannot change the cached run', () => {
    const a = inter.layout('Field settings');
    a.glyphs.length = 0;
    expect(inter.layout('Field settings').glyphs.length).toBeGreaterThan(0);
  });

  it('keeps runs with different features apart', () => {
    const plain = inter.layout('1/2', undefined);
    const other = inter.layout('1/2', { frac: true });
    expect(plain).not.toBe(other);
    expect(inter.layout('1/2').glyphs.map((g) => g.id)).toEqual(plain.glyphs.map((g) => g.id));
  });

  it('wraps each font once', () => {
    const wrapped = inter.layout;
    memoiseGlyphLayout();
    expect(inter.layout).toBe(wrapped);
  });
});
