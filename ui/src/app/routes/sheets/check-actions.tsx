import { useState } from 'react';
import { Button, Text } from '@mantine/core';
import { IconArrowBackUp, IconCircleCheck } from '@tabler/icons-react';
import type { Revision } from '@holdfast/shared';
import { useApproveRevision } from '../../../features/revisions/api/approve-revision';
import { useReturnRevision } from '../../../features/revisions/api/return-revision';
import { ApproveDialog } from '../../../features/review/components/approve-dialog';
import { ReturnDialog } from '../../../features/review/components/return-dialog';
import { hasRole, useCurrentUser } from '../../../lib/session';

export interface CheckActionsProps {
  revision: Revision;
  openComments: number;
}

/**
 * Return and Approve, for a checker who may check this revision. Used wherever the checker
 * reviews (the calculation tab and the review tab), so the decision is never a tab away.
 */
export function CheckActions({ revision, openComments }: CheckActionsProps) {
  const [dialog, setDialog] = useState<'approve' | 'return' | null>(null);
  const approve = useApproveRevision(revision.id);
  const ret = useReturnRevision(revision.id);
  const user = useCurrentUser();
  if (!revision.canCheck) {
    // A checker looking for Approve on a revision in check is told why it is not there.
    return revision.state === 'in_check' && hasRole(user, 'checker') ? (
      <Text size="sm" c="dimmed" data-testid="no-check-reason">
        You wrote, edited or submitted this revision: another checker approves or returns it.
      </Text>
    ) : null;
  }
  const close = () => setDialog(null);
  return (
    <>
      <Button
        size="sm"
        color="fail.7"
        variant="outline"
        leftSection={<IconArrowBackUp size={16} aria-hidden />}
        onClick={() => setDialog('return')}
      >
        Return
      </Button>
      <Button
        size="sm"
        color="pass.8"
        leftSection={<IconCircleCheck size={16} aria-hidden />}
        onClick={() => setDialog('approve')}
      >
        Approve
      </Button>
      <ApproveDialog
        opened={dialog === 'approve'}
        onClose={close}
        revisionLabel={revision.label}
        openComments={openComments}
        failingChecks={(revision.evaluation?.checks ?? [])
          .filter((c) => !c.pass)
          .map((c) => c.label)}
        justification={revision.justification}
        onApprove={(note) => approve.mutateAsync({ rowVersion: revision.rowVersion, note })}
      />
      <ReturnDialog
        opened={dialog === 'return'}
        onClose={close}
        authorName={revision.author.displayName}
        justification={revision.justification}
        onReturn={(comment) => ret.mutateAsync({ rowVersion: revision.rowVersion, comment })}
      />
    </>
  );
}
