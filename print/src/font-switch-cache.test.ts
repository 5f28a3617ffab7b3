import { Font } from '@react-pdf/renderer';
import PDFDocument from 'pdfkit';
import { beforeAll, describe, expect, it } from 'vitest';
import { registerPdfFonts } from './fonts.js';
import { rememberEmbeddedFonts } from './font-switch-cache.js';
import { TextMeasure } from './measure.js';

interface Doc {
  font(src: unknown, size?: number): Doc;
  _font: { name?: string };
  _fontSize: number;
}
const newDoc = () =>
  new (PDFDocument as unknown as new (o: object) => Doc)({ autoFirstPage: false });
const fontkitFont = (fontFamily: string, fontWeight: number) =>
  (Font.getFont({ fontFamily, fontWeight }) as unknown as { data: object }).data;

describe('pdfkit font switching, remembered per document', () => {
  beforeAll(async () => {
    registerPdfFonts();
    await TextMeasure.load();
    rememberEmbeddedFonts();
    rememberEmbeddedFonts(); // a second call must not wrap twice
  }, 60_000);

  it('gives the same embedded font for the same font object, with the new size', () => {
    const doc = newDoc();
    const regular = fontkitFont('Inter', 400);
    const first = doc.font(regular, 8)._font;
    const again = doc.font(regular, 11)._font;
    expect(again).toBe(first);
    expect(doc._fontSize).toBe(11);
    expect(doc.font(fontkitFont('Inter', 700), 8)._font).not.toBe(first);
    expect(doc.font(regular)._font).toBe(first);
  });

  it('keeps documents apart and passes font names through to pdfkit', () => {
    const a = newDoc();
    const b = newDoc();
    const regular = fontkitFont('Inter', 400);
    expect(a.font(regular, 8)._font).not.toBe(b.font(regular, 8)._font);
    expect(a.font('Helvetica', 9)._font.name).toBe('Helvetica');
    expect(a.font(regular, 8)._font).not.toBe(a.font('Helvetica')._font);
  });
});
