import type { TextMeasure } from './measure.js';
import { titleBlockHeight } from './parts/title-block.js';
import type { Paper, PrintableSheet } from './printable-sheet.js';

/** Page sizes in PostScript points (1/72 in). */
export const PAPER_SIZE: Record<Paper, { width: number; height: number }> = {
  A4: { width: 595.28, height: 841.89 },
  LETTER: { width: 612, height: 792 },
};

export const MARGIN_X = 34;
export const PADDING_TOP = 28;
export const PADDING_BOTTOM = 40;

/** Slack left at the foot of each planned page for rounding in the measured heights, pt. */
const PLANNING_SLACK = 6;

/** Usable width between the side margins. */
export function contentWidth(paper: Paper): number {
  return PAPER_SIZE[paper].width - 2 * MARGIN_X;
}

/**
 * Height in pt left for content on one page of `sheet`: the page less its paddings, the title
 * block and (when the revision is marked) the state banner, less a little slack.
 */
export function pageCapacity(sheet: PrintableSheet, m: TextMeasure): number {
  const marked = sheet.revision.state !== 'approved';
  // The banner: one 8 pt bold line, 2 × 2 padding, 2 × 1.2 border, margins −4 and 8.
  const banner = marked ? m.lineHeight({ fontSize: 8, weight: 700 }) + 4 + 2.4 - 4 + 8 : 0;
  return (
    PAPER_SIZE[sheet.paper].height -
    PADDING_TOP -
    PADDING_BOTTOM -
    titleBlockHeight(sheet, m, contentWidth(sheet.paper)) -
    banner -
    PLANNING_SLACK
  );
}
