import type { TextMeasure } from './measure.js';
import { titleBlockHeight } from './parts/title-block.js';
import type { Paper, PrintableSheet } from './printable-sheet.js';
import { s } from './theme.js';

/** Page sizes in PostScript points (1/72 in). */
export const PAPER_SIZE: Record<Paper, { width: number; height: number }> = {
  A4: { width: 595.28, height: 841.89 },
  LETTER: { width: 612, height: 792 },
};

// The page's margins as the page style sets them.
const MARGIN_X = s.page.paddingHorizontal;
const PADDING_TOP = s.page.paddingTop;
const PADDING_BOTTOM = s.page.paddingBottom;

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
