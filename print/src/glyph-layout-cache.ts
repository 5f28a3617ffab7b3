import { Font } from '@react-pdf/renderer';

/** The part of a fontkit font that text layout calls. */
interface LayoutFont {
  layout: (text: string, features?: unknown, ...rest: unknown[]) => GlyphRunLike;
  [MEMOISED]?: true;
}

interface GlyphRunLike {
  glyphs: unknown[];
  positions: unknown[];
}

const MEMOISED = Symbol('holdfast.memoisedLayout');

/** Distinct strings kept per font before the cache starts over (a sheet prints a few thousand). */
const MAX_ENTRIES = 20_000;

/**
 * Shaping the same string in the same font always gives the same glyphs and advances, and a
 * calculation sheet repeats most of its strings (units, symbols, labels, the title block on
 * every page), so each loaded font remembers its shaped runs. react-pdf copies the positions
 * before scaling them and slices glyph arrays rather than editing them; the cache still hands
 * out a fresh glyph array so no caller can change a cached run.
 *
 * Call before each render: fonts load lazily, the first time a document uses them.
 */
export function memoiseGlyphLayout(): void {
  for (const family of Object.values(Font.getRegisteredFonts())) {
    for (const source of (family as { sources: { data: unknown }[] }).sources) {
      const font = source.data as LayoutFont | null;
      if (!font || typeof font.layout !== 'function' || font[MEMOISED]) continue;
      wrap(font);
    }
  }
}

function wrap(font: LayoutFont): void {
  const shape = font.layout.bind(font);
  const cache = new Map<string, GlyphRunLike>();
  font.layout = (text, features, ...rest) => {
    // Script, language and direction arguments change shaping: only the common call is cached.
    if (rest.some((r, i) => r !== undefined && !(i === 2 && r === 'ltr'))) {
      return shape(text, features, ...rest);
    }
    const key = `${featureKey(features)}\u0000${text}`;
    let run = cache.get(key);
    if (!run) {
      if (cache.size >= MAX_ENTRIES) cache.clear();
      run = shape(text, features, ...rest);
      cache.set(key, run);
    }
    return Object.assign(Object.create(Object.getPrototypeOf(run) as object) as GlyphRunLike, run, {
      glyphs: run.glyphs.slice(),
    });
  };
  font[MEMOISED] = true;
}

function featureKey(features: unknown): string {
  if (features === undefined || features === null) return '';
  if (Array.isArray(features)) return features.join(',');
  return JSON.stringify(features);
}
