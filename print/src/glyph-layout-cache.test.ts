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

  it('keeps runs shaped with different features apart', () => {
    // Kerning (GPOS) stays in the fonts: 'AV' kerned is narrower than 'AV' with kern off. A cache
    // keyed on the text alone would hand the first of the two to the second call.
    const width = (run: Run) => run.positions.reduce((sum, p) => sum + p.xAdvance, 0);
    const kerned = width(inter.layout('AVAVAV'));
    const unkerned = width(inter.layout('AVAVAV', { kern: false }));
    expect(unkerned).toBeGreaterThan(kerned);
    expect(width(inter.layout('AVAVAV'))).toBe(kerned);
    expect(width(inter.layout('AVAVAV', { kern: false }))).toBe(unkerned);
  });

  it('wraps each font once', () => {
    const wrapped = inter.layout;
    memoiseGlyphLayout();
    expect(inter.layout).toBe(wrapped);
  });
});
