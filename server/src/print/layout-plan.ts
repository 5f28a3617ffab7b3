/**
 * Page planning by estimated heights.
 *
 * react-pdf re-lays out everything that follows a page break inside one `Page` element at every
 * break (the title block's "page n of N" makes pages dynamic), so a 10-page derivation in one
 * element costs quadratic time — seconds for a hoist sheet. The sheet is therefore cut into
 * `Page` elements of about one printed page each, from conservative height estimates. An
 * estimate that is off costs looks, never content: react-pdf still breaks an element that
 * overflows.
 */

export interface Block<T> {
  item: T;
  /** Estimated height in pt. */
  height: number;
  /** Headings: never the last block of a page. */
  keepWithNext?: boolean;
}

/** Greedy packing of blocks into pages of `capacity` pt. */
export function packPages<T>(
  blocks: Block<T>[],
  capacity: number,
  firstCapacity = capacity,
): Block<T>[][] {
  const pages: Block<T>[][] = [];
  let page: Block<T>[] = [];
  let used = 0;
  let cap = firstCapacity;
  for (const b of blocks) {
    if (page.length > 0 && used + b.height > cap) {
      // Move trailing headings along with the block they introduce.
      const carried: Block<T>[] = [];
      while (page.length > 0 && page[page.length - 1].keepWithNext) carried.unshift(page.pop()!);
      if (page.length > 0) pages.push(page);
      page = carried;
      used = carried.reduce((sum, c) => sum + c.height, 0);
      cap = capacity;
    }
    page.push(b);
    used += b.height;
  }
  if (page.length > 0) pages.push(page);
  return pages;
}

/** Average advance width of a character as a fraction of the font size. */
const SANS_CHAR = 0.53;
const MONO_CHAR = 0.6;

/** Estimated number of lines `text` wraps to in `width` pt (explicit newlines respected). */
export function lines(text: string, width: number, fontSize: number, mono = false): number {
  const perLine = Math.max(1, Math.floor(width / (fontSize * (mono ? MONO_CHAR : SANS_CHAR))));
  return text.split('\n').reduce((n, part) => n + Math.max(1, Math.ceil(part.length / perLine)), 0);
}

/** Line height react-pdf uses for Inter / JetBrains Mono at `fontSize` (font metrics, no lineHeight). */
export const lineHeight = (fontSize: number, mono = false) => fontSize * (mono ? 1.32 : 1.21);
