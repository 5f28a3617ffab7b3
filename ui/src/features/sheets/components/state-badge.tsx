import { Badge } from '@mantine/core';
import {
  IconArchive,
  IconArrowBackUp,
  IconCircleCheck,
  IconEye,
  IconPencil,
} from '@tabler/icons-react';
import type { RevisionState } from '@holdfast/shared';
import { stateLabel } from '../../../lib/state-label';

const STATES: Record<RevisionState, { color: string; icon: typeof IconPencil }> = {
  draft: { color: 'gray', icon: IconPencil },
  in_check: { color: 'amber', icon: IconEye },
  returned: { color: 'fail', icon: IconArrowBackUp },
  approved: { color: 'pass', icon: IconCircleCheck },
  superseded: { color: 'steel', icon: IconArchive },
};

/** A revision state in words with an icon; colour only repeats the word. */
export function StateBadge({
  state,
  size = 'sm',
}: {
  state: RevisionState;
  size?: 'xs' | 'sm' | 'md' | 'lg';
}) {
  const s = STATES[state];
  return (
    <Badge
      color={s.color}
      size={size}
      leftSection={<s.icon size={12} aria-hidden />}
      data-state={state}
    >
      {stateLabel(state)}
    </Badge>
  );
}
