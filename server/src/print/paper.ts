import type { Paper } from './printable-sheet.js';

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
