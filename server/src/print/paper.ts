import type { Paper, PrintableSheet } from './printable-sheet.js';

/** Page sizes in PostScript points (1/72 in). */
export const PAPER_SIZE: Record<Paper, { width: number; height: number }> = {
  A4: { width: 595.28, height: 841.89 },
  LETTER: { width: 612, height: 792 },
};

export const MARGIN_X = 34;

/** Usable width between the side margins. */
export function contentWidth(paper: Paper): number {
  return PAPER_SIZE[paper].width - 2 * MARGIN_X;
}

/**
 * Estimated height in pt left for content on one page: the page less its paddings, the title
 * block and (when the revision is marked) the state banner, with a margin for estimate error.
 */
export function pageCapacity(sheet: PrintableSheet): number {
  const marked = sheet.revision.state !== 'approved';
  return (PAPER_SIZE[sheet.paper].height - 28 - 40 - 62 - (marked ? 22 : 0)) * 0.94;
}
