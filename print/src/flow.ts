import type { ReactElement } from 'react';

/**
 * One unbreakable piece of a printed sheet with its measured height: a heading, a paragraph, a
 * table row, a derivation step, a chart. The sheet is a list of these, cut into pages here.
 */
export interface FlowBlock {
  key: string;
  /** Height in pt including its margins, measured with the PDF fonts (see TextMeasure). */
  height: number;
  element: ReactElement;
  /** Headings and table headers: never the last block of a page. */
  keepWithNext?: boolean;
  /** Starts a new page (a new part of the sheet: derivation, charts, settings). */
  pageBreakBefore?: boolean;
  /**
   * Printed first when this block has to open a page in the middle of its group, so a table
   * continued on the next page repeats its heading and column header.
   */
  carry?: FlowBlock[];
}

/**
 * Greedy page filling: blocks go on the current page until the next one does not fit; trailing
 * headings move on with the block they introduce; a block that opens a page mid-table brings its
 * `carry` with it. A block taller than a whole page gets a page of its own (it will overflow and
 * the renderer falls back to react-pdf's own page breaking).
 */
export function paginate(blocks: FlowBlock[], capacity: number): FlowBlock[][] {
  const pages: FlowBlock[][] = [];
  let page: FlowBlock[] = [];
  let used = 0;
  const total = (list: FlowBlock[]) => list.reduce((sum, b) => sum + b.height, 0);
  for (const block of blocks) {
    const full = used + block.height > capacity;
    if (page.length > 0 && (block.pageBreakBefore || full)) {
      const moved: FlowBlock[] = [];
      if (!block.pageBreakBefore) {
        while (page.length > 0 && page[page.length - 1].keepWithNext) moved.unshift(page.pop()!);
      }
      if (page.length > 0) pages.push(page);
      page = moved.length === 0 && block.carry && !block.pageBreakBefore ? [...block.carry] : moved;
      used = total(page);
    }
    page.push(block);
    used += block.height;
  }
  if (page.length > 0) pages.push(page);
  return pages;
}
