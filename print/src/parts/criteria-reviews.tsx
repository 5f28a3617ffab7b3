import { headingBlock, paragraphBlock, type BlockContext } from '../blocks.js';
import type { FlowBlock } from '../flow.js';
import { day } from '../format.js';
import type { PrintableSheet } from '../printable-sheet.js';
import { colours } from '../theme.js';

/**
 * Criteria reviews of an approved revision: an open "under review" flag in the marking colour,
 * then each checker's disposition ("reviewed, stands because …"). Nothing when there are none.
 */
export function criteriaReviewBlocks(ctx: BlockContext, sheet: PrintableSheet): FlowBlock[] {
  const reviews = sheet.criteriaReviews ?? [];
  if (reviews.length === 0) return [];
  return [
    headingBlock(ctx, 'reviews-h', 'Criteria reviews'),
    ...reviews.map((r, i) =>
      r.disposition === null
        ? paragraphBlock(
            ctx,
            `review-${i}`,
            `Under review since ${day(r.flaggedAt)}: criteria ${r.criteriaSetName} version ${r.criteriaSetVersion} was published after this approval, and the stored inputs fail it (${r.failing.join('; ')}). Check /verify before using this printout.`,
            { fontSize: 8.5, weight: 700, color: colours.marking, marginBottom: 3 },
          )
        : paragraphBlock(
            ctx,
            `review-${i}`,
            `Reviewed against criteria ${r.criteriaSetName} version ${r.criteriaSetVersion} (flagged ${day(r.flaggedAt)}). Stands because: ${r.disposition} — ${r.checker ?? 'a checker'}, ${r.clearedAt ? day(r.clearedAt) : ''}.`,
            { fontSize: 8.5, marginBottom: 3 },
          ),
    ),
  ];
}
