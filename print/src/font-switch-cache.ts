import PDFDocument from 'pdfkit';

interface FontSwitching {
  font(src: unknown, family?: unknown, size?: unknown): FontSwitching;
  fontSize(size: number): FontSwitching;
  _font: unknown;
  _fontSource: unknown;
  _fontFamily: unknown;
}

const PATCHED = Symbol.for('holdfast.pdfkitFontSwitch');
const embedded = new WeakMap<object, WeakMap<object, unknown>>();

/**
 * react-pdf switches fonts for every run of text by handing pdfkit the fontkit font object, and
 * pdfkit then builds a new embedded-font wrapper each time and compares it with the ones it has
 * by serialising their name tables (~8 % of a sheet render). The outcome is always the wrapper
 * first made for that font object in this document, so it is remembered per document and font.
 * Calls with a font name (standard fonts, registered names) go to pdfkit unchanged.
 */
export function rememberEmbeddedFonts(): void {
  const proto = PDFDocument.prototype as FontSwitching & { [PATCHED]?: true };
  if (proto[PATCHED]) return;
  const original = proto.font;
  proto.font = function font(this: FontSwitching, src: unknown, family?: unknown, size?: unknown) {
    if (
      typeof src !== 'object' ||
      src === null ||
      (family !== undefined && typeof family !== 'number')
    ) {
      return original.call(this, src, family, size);
    }
    let known = embedded.get(this);
    if (!known) embedded.set(this, (known = new WeakMap()));
    const wrapper = known.get(src);
    if (wrapper === undefined) {
      original.call(this, src, family, size);
      known.set(src, this._font);
      return this;
    }
    this._fontSource = src;
    this._fontFamily = null;
    this._font = wrapper;
    const points = typeof family === 'number' ? family : size;
    if (points != null) this.fontSize(points as number);
    return this;
  };
  proto[PATCHED] = true;
}
