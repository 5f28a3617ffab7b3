import { describe, expect, it } from 'vitest';
import { suggestedSheetType } from './suggested-sheet-type';

describe('suggestedSheetType', () => {
  it('follows the motion for shoe brakes', () => {
    expect(suggestedSheetType({ motion: 'hoist', brakeKind: 'thruster shoe brake' })).toBe(
      'hoist-shoe-brake',
    );
    expect(suggestedSheetType({ motion: 'auxiliary-hoist', brakeKind: '' })).toBe(
      'hoist-shoe-brake',
    );
    for (const motion of ['trolley', 'bridge', 'travel'] as const)
      expect(suggestedSheetType({ motion, brakeKind: '' })).toBe('travel-shoe-brake');
    for (const motion of ['conveyor', 'slew', 'other'] as const)
      expect(suggestedSheetType({ motion, brakeKind: 'drum brake' })).toBe('drive-shoe-brake');
  });

  it('takes the caliper sheet when the plant calls the brake a caliper or disc brake', () => {
    expect(suggestedSheetType({ motion: 'hoist', brakeKind: 'Caliper, spring-applied' })).toBe(
      'caliper-disc-brake',
    );
    expect(suggestedSheetType({ motion: 'conveyor', brakeKind: 'hydraulic disc brake' })).toBe(
      'caliper-disc-brake',
    );
    // A disc-spring stack inside a drum brake is not a disc brake.
    expect(suggestedSheetType({ motion: 'hoist', brakeKind: 'drum brake, disc springs' })).toBe(
      'hoist-shoe-brake',
    );
  });
});
