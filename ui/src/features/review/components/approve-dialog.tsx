import { Text } from '@mantine/core';
import { ActionDialog } from '../../../components/action-dialog';
import { AuthorNote } from './author-note';

export interface ApproveDialogProps {
  opened: boolean;
  onClose: () => void;
  revisionLabel: string;
  openComments: number;
  /** The author's note to the checker, when checks failed. */
  justification?: string | null;
  onApprove: (note: string | undefined) => Promise<unknown>;
}

export function ApproveDialog({
  opened,
  onClose,
  revisionLabel,
  openComments,
  justification = null,
  onApprove,
}: ApproveDialogProps) {
  return (
    <ActionDialog
      opened={opened}
      onClose={onClose}
      title={`Approve revision ${revisionLabel}`}
      intro={
        <>
          <Text size="sm">
            Approving signs this revision as checked. It can never change afterwards; a revision of
            this sheet approved before it, if there is one, becomes superseded.
          </Text>
          {openComments > 0 ? (
            <Text size="sm" c="amber.9" fw={500}>
              {openComments === 1 ? 'One comment is' : `${openComments} comments are`} still open,
              and {openComments === 1 ? 'stays' : 'stay'} open on the approved revision for good:
              answer {openComments === 1 ? 'it' : 'them'} first, or say why in the note.
            </Text>
          ) : null}
          <AuthorNote justification={justification} />
        </>
      }
      textLabel={
        openComments > 0
          ? 'Approval note (required while comments are open)'
          : 'Approval note (optional)'
      }
      textField="note"
      textRequired={openComments > 0}
      requiredMessage={`${openComments === 1 ? 'One comment is' : `${openComments} comments are`} still open: resolve ${openComments === 1 ? 'it' : 'them'} first, or say here why you approve.`}
      confirmLabel="Approve"
      confirmColor="pass.8"
      onConfirm={(text) => onApprove(text || undefined)}
    />
  );
}
