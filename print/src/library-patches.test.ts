import { Document, Font, Page, Text, renderToBuffer } from '@react-pdf/renderer';
import PDFDocument from 'pdfkit';
import { createElement } from 'react';
import { beforeAll, describe, expect, it } from 'vitest';
import { rememberEmbeddedFonts } from './font-switch-cache.js';
import { registerPdfFonts, SANS } from './fonts.js';
import { memoiseGlyphLayout } from './glyph-layout-cache.js';
import { TextMeasure } from './measure.js';

/*
 * The caches patch objects react-pdf owns (its fontkit fonts, pdfkit's document prototype). Their
 * own tests show that a patched object behaves as before; these show that react-pdf still goes
 * through the patched objects when it renders. If an upgrade moves its fonts or stops calling
 * `font.layout` or `doc.font`, the patches would silently do nothing and a render would only get
 * slower: these tests fail instead (docs/decisions/0004).
 */
type Shaper = { layout: (...args: unknown[]) => unknown };
const fontkitFont = (fontFamily: string, fontWeight: number) =>
  (Font.getFont({ fontFamily, fontWeight }) as unknown as { data: Shaper }).data;

/** A one-page document in the sheet's sans stack, rendered through react-pdf. */
async function renderLine(text: string, onRender?: (r: unknown) => void): Promise<Uint8Array> {
  const doc = createElement(
    Document,
    { onRender },
    createElement(
      Page,
      { size: 'A4' },
      createElement(Text, { style: { fontFamily: SANS, fontSize: 10 } }, text),
    ),
  );
  return renderToBuffer(doc as never);
}

describe('react-pdf still goes through the patched library objects', () => {
  let unpatchedLayout: Shaper['layout'];
  beforeAll(async () => {
    registerPdfFonts();
    await TextMeasure.load();
    unpatchedLayout = fontkitFont('Inter', 400).layout;
    memoiseGlyphLayout();
    rememberEmbeddedFonts();
  }, 60_000);

  it('the registered fonts are where the glyph cache looks for them, and it wraps them', () => {
    const families = Font.getRegisteredFonts() as Record<string, { sources: { data: unknown }[] }>;
    for (const family of SANS) expect(families[family]?.sources.length).toBeGreaterThan(0);
    expect(fontkitFont('Inter', 400).layout).not.toBe(unpatchedLayout);
  });

  it('react-pdf shapes text with the font object the glyph cache wrapped', async () => {
    const inter = fontkitFont('Inter', 400);
    const cached = inter.layout;
    const seen: unknown[] = [];
    inter.layout = (...args: unknown[]) => {
      seen.push(args[0]);
      return cached.apply(inter, args);
    };
    try {
      await renderLine('Brake torque at minimum friction');
    } finally {
      inter.layout = cached;
    }
    expect(seen.length).toBeGreaterThan(0);
    expect(seen.join('')).toContain('Brake');
  });

  it("react-pdf draws through pdfkit's document prototype that the font-switch cache patched", async () => {
    const proto = PDFDocument.prototype as unknown as { font: (...a: unknown[]) => unknown };
    const patched = proto.font;
    let calls = 0;
    proto.font = function (this: unknown, ...args: unknown[]) {
      calls++;
      return patched.apply(this, args);
    };
    try {
      await renderLine('Field settings');
    } finally {
      proto.font = patched;
    }
    expect(calls).toBeGreaterThan(0);
  });

  it('the layout react-pdf hands to onRender gives each page its box height', async () => {
    let result: unknown;
    await renderLine('Page height', (r) => (result = r));
    const layout = (result as { _INTERNAL__LAYOUT__DATA_?: { children?: unknown[] } })
      ._INTERNAL__LAYOUT__DATA_;
    const pages = (layout?.children ?? []) as { box?: { height?: number } }[];
    expect(pages).toHaveLength(1);
    // A4 is 841.89 pt tall; a page that may break has exactly the paper's height.
    expect(pages[0]?.box?.height).toBeCloseTo(841.89, 1);
  });
});
