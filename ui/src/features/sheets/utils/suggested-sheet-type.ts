import type { Position, SheetTypeId } from '@holdfast/shared';

/**
 * The sheet type a position most likely needs, from its motion and the plant's words for the
 * brake: a caliper or disc brake gets the caliper sheet; otherwise a hoist motion the hoist sheet,
 * a travel motion the travel sheet, anything else the drive sheet. Only a first choice in the
 * new-sheet dialog: the engineer can pick another.
 */
export function suggestedSheetType(p: Pick<Position, 'motion' | 'brakeKind'>): SheetTypeId {
  if (/\b(caliper|calliper|disc brake)\b/i.test(p.brakeKind)) return 'caliper-disc-brake';
  switch (p.motion) {
    case 'hoist':
    case 'auxiliary-hoist':
      return 'hoist-shoe-brake';
    case 'trolley':
    case 'bridge':
    case 'travel':
      return 'travel-shoe-brake';
    default:
      return 'drive-shoe-brake';
  }
}
