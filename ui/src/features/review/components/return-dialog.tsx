import { Text } from '@mantine/core';
import { ActionDialog } from '../../../components/action-dialog';
import { AuthorNote } from './author-note';

export interface ReturnDialogProps {
  opened: boolean;
  onClose: () => void;
  authorName: string;
  /** The author's note to the checker, when checks failed. */
  justification?: string | null;
  onReturn: (comment: string) => Promise<unknown>;
}

export function ReturnDialog({
  opened,
  onClose,
  authorName,
  justification = null,
  onReturn,
}: ReturnDialogProps) {
  return (
    <ActionDialog
      opened={opened}
      onClose={onClose}
      title="Return to the author"
      intro={
        <>
          <Text size="sm">
            The revision goes back to {authorName} as a draft to change. Say what must change;
            pinned comments on inputs and steps stay in place.
          </Text>
          <AuthorNote justification={justification} />
        </>
      }
      textLabel="What must change"
      textField="comment"
      textRequired
      requiredMessage="Say what must change."
      confirmLabel="Return"
      confirmColor="fail.7"
      onConfirm={onReturn}
    />
  );
}
