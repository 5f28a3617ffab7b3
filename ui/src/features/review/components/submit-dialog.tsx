import { List, Text } from '@mantine/core';
import type { CheckResult } from '@holdfast/calc';
import { ActionDialog } from '../../../components/action-dialog';

export interface SubmitDialogProps {
  opened: boolean;
  onClose: () => void;
  /** Checks failing in the current inputs; any failure makes a justification required. */
  failingChecks: CheckResult[];
  onSubmit: (justification: string | undefined) => Promise<unknown>;
}

export function SubmitDialog({ opened, onClose, failingChecks, onSubmit }: SubmitDialogProps) {
  const failing = failingChecks.length > 0;
  return (
    <ActionDialog
      opened={opened}
      onClose={onClose}
      title="Send for check"
      intro={
        failing ? (
          <>
            <Text size="sm">
              {failingChecks.length === 1
                ? 'One check fails'
                : `${failingChecks.length} checks fail`}
              . A revision with failing checks goes to check only with your reason, which the
              checker sees and the printout records.
            </Text>
            <List size="sm">
              {failingChecks.map((c) => (
                <List.Item key={c.id}>{c.label}</List.Item>
              ))}
            </List>
          </>
        ) : (
          <Text size="sm">
            Every check passes. The server recalculates the revision with its own calc core, freezes
            the inputs and results, and a checker other than you reviews it.
          </Text>
        )
      }
      textLabel={failing ? 'Why this should go to check anyway' : 'Note to the checker (optional)'}
      textField="justification"
      textRequired={failing}
      requiredMessage="Give a reason: checks fail."
      confirmLabel="Send for check"
      onConfirm={(text) => onSubmit(text || undefined)}
    />
  );
}
