import { Font } from '@react-pdf/renderer';
import { MONO, SANS } from './fonts.js';

/** The fontkit font fields text measuring reads. */
interface MetricFont {
  unitsPerEm: number;
  ascent: number;
  descent: number;
  lineGap: number;
  glyphForCodePoint(cp: number): { id: number; advanceWidth: number };
}

export interface TextStyle {
  fontSize: number;
  mono?: boolean;
  /** 400, 600 or 700. */
  weight?: number;
}

const WEIGHTS = { sans: [400, 600, 700], mono: [400, 700] } as const;

/** Width of a glyph no font in the stack has (react-pdf then prints a box): one em, pessimistic. */
const MISSING_EM = 1;

/**
 * Measures text with the PDF's own font files, so page planning knows how many lines a string
 * wraps to in a given width. Widths are the glyph advances, taken from the first font of the
 * stack that has the glyph (as react-pdf picks them); kerning is ignored (a fraction of a
 * percent). Line breaks are greedy at spaces; react-pdf may also break after a hyphen or a
 * slash, so it rarely needs more lines than counted here, and page capacity keeps a margin.
 */
export class TextMeasure {
  private readonly advance = new Map<string, number>();

  private constructor(private readonly stacks: Map<string, MetricFont[]>) {}

  /** Loads every weight of both stacks (fonts must be registered first). */
  static async load(): Promise<TextMeasure> {
    const stacks = new Map<string, MetricFont[]>();
    for (const [kind, families] of [
      ['sans', SANS],
      ['mono', MONO],
    ] as const) {
      for (const weight of WEIGHTS[kind]) {
        const fonts: MetricFont[] = [];
        for (const fontFamily of families) {
          await Font.load({ fontFamily, fontWeight: weight });
          const source = Font.getFont({ fontFamily, fontWeight: weight }) as {
            data: MetricFont | null;
          } | null;
          if (source?.data) fonts.push(source.data);
        }
        stacks.set(`${kind}${weight}`, fonts);
      }
    }
    return new TextMeasure(stacks);
  }

  private stack(style: TextStyle): MetricFont[] {
    const kind = style.mono ? 'mono' : 'sans';
    const wanted = style.weight ?? 400;
    // Like react-pdf: the nearest registered weight (mono has no 600; 600 falls to 700).
    const weight = WEIGHTS[kind].find((w) => w >= wanted) ?? 700;
    const fonts = this.stacks.get(`${kind}${weight}`);
    if (!fonts || fonts.length === 0) throw new Error(`measure: no fonts for ${kind} ${weight}`);
    return fonts;
  }

  /** Advance of one character in em, from the first font of the stack that has it. */
  private charEm(ch: string, style: TextStyle): number {
    const key = `${style.mono ? 'm' : 's'}${style.weight ?? 400}${ch}`;
    let em = this.advance.get(key);
    if (em === undefined) {
      em = MISSING_EM;
      const cp = ch.codePointAt(0) ?? 32;
      for (const font of this.stack(style)) {
        const glyph = font.glyphForCodePoint(cp);
        if (glyph.id !== 0) {
          em = glyph.advanceWidth / font.unitsPerEm;
          break;
        }
      }
      this.advance.set(key, em);
    }
    return em;
  }

  /** Width of `text` in pt on one line. */
  width(text: string, style: TextStyle): number {
    let em = 0;
    for (const ch of text) em += this.charEm(ch, style);
    return em * style.fontSize;
  }

  /** Height of one line in pt (the primary font's ascent, descent and line gap). */
  lineHeight(style: TextStyle): number {
    const f = this.stack(style)[0];
    return ((f.ascent - f.descent + f.lineGap) / f.unitsPerEm) * style.fontSize;
  }

  /** Lines `text` wraps to in `width` pt; explicit newlines start new lines. */
  lines(text: string, width: number, style: TextStyle): number {
    let count = 0;
    for (const paragraph of text.split('\n')) count += this.paragraphLines(paragraph, width, style);
    return count;
  }

  /** Height in pt of `text` wrapped in `width` pt. */
  height(text: string, width: number, style: TextStyle): number {
    return this.lines(text, width, style) * this.lineHeight(style);
  }

  private paragraphLines(paragraph: string, width: number, style: TextStyle): number {
    const space = this.width(' ', style);
    let lines = 1;
    let used = 0;
    for (const word of paragraph.split(' ')) {
      const w = this.width(word, style);
      const needed = used === 0 ? w : used + space + w;
      if (needed <= width) {
        used = needed;
        continue;
      }
      if (used > 0) lines += 1;
      // A word wider than the line is cut wherever it fills one.
      if (w > width) {
        lines += Math.ceil(w / width) - 1;
        used = w - (Math.ceil(w / width) - 1) * width;
      } else {
        used = w;
      }
    }
    return lines;
  }
}
