import { List, Text } from '@mantine/core';
import { ActionDialog } from '../../../components/action-dialog';
import { AuthorNote } from './author-note';

export interface ApproveDialogProps {
  opened: boolean;
  onClose: () => void;
  revisionLabel: string;
  openComments: number;
  /** Labels of the checks the revision fails: the checker signs them failing, so says why. */
  failingChecks?: readonly string[];
  /** The author's note to the checker, when checks failed. */
  justification?: string | null;
  onApprove: (note: string | undefined) => Promise<unknown>;
}

const count = (n: number, one: string, many: string) => (n === 1 ? one : `${n} ${many}`);

/** Why the note is required, as the server says it (400 on `note`), or null when it is optional. */
function requiredBecause(openComments: number, failing: number): string | null {
  const comments = `${count(openComments, 'One comment is', 'comments are')} still open`;
  const checks = count(failing, 'one check fails', 'checks fail');
  if (openComments > 0 && failing > 0)
    return `${comments} and ${checks}: resolve the ${openComments === 1 ? 'comment' : 'comments'} first, or say here why you approve.`;
  if (openComments > 0)
    return `${comments}: resolve ${openComments === 1 ? 'it' : 'them'} first, or say here why you approve.`;
  if (failing > 0)
    return `${checks.charAt(0).toUpperCase()}${checks.slice(1)}: say here why you approve.`;
  return null;
}

export function ApproveDialog({
  opened,
  onClose,
  revisionLabel,
  openComments,
  failingChecks = [],
  justification = null,
  onApprove,
}: ApproveDialogProps) {
  const required = requiredBecause(openComments, failingChecks.length);
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
          {failingChecks.length > 0 ? (
            <div data-testid="approve-failing-checks">
              <Text size="sm" c="fail.8" fw={600}>
                {failingChecks.length === 1
                  ? 'One check fails, and is signed failing:'
                  : `${failingChecks.length} checks fail, and are signed failing:`}
              </Text>
              <List size="sm" c="fail.8">
                {failingChecks.map((label) => (
                  <List.Item key={label}>{label}</List.Item>
                ))}
              </List>
            </div>
          ) : null}
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
        failingChecks.length > 0
          ? 'Approval note (required: why it is approved with checks failing)'
          : openComments > 0
            ? 'Approval note (required while comments are open)'
            : 'Approval note (optional)'
      }
      textField="note"
      textRequired={required !== null}
      requiredMessage={required ?? ''}
      confirmLabel="Approve"
      confirmColor="pass.8"
      onConfirm={(text) => onApprove(text || undefined)}
    />
  );
}
