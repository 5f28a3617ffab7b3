import { Badge } from '@mantine/core';
import {
  IconArchive,
  IconArrowBackUp,
  IconCircleCheck,
  IconEye,
  IconPencil,
} from '@tabler/icons-react';
import type { RevisionState } from '@holdfast/shared';

const STATES: Record<RevisionState, { label: string; color: string; icon: typeof IconPencil }> = {
  draft: { label: 'Draft', color: 'gray', icon: IconPencil },
  in_check: { label: 'In check', color: 'amber', icon: IconEye },
  returned: { label: 'Returned', color: 'fail', icon: IconArrowBackUp },
  approved: { label: 'Approved', color: 'pass', icon: IconCircleCheck },
  superseded: { label: 'Superseded', color: 'steel', icon: IconArchive },
};

export const stateLabel = (state: RevisionState) => STATES[state].label;

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
      {s.label}
    </Badge>
  );
}
