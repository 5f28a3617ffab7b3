import type { ReactNode } from 'react';
import { Alert, Button, Group, type MantineColor } from '@mantine/core';

export interface DialogActionsProps {
  /** A failure that belongs to no single field, shown above the buttons. */
  error?: ReactNode;
  onCancel: () => void;
  confirmLabel: ReactNode;
  /** Without it the confirm button submits the dialog's form. */
  onConfirm?: () => void;
  pending?: boolean;
  confirmDisabled?: boolean;
  confirmColor?: MantineColor;
  /** Cancel is held while the action runs (it cannot be taken back half way). */
  holdCancelWhilePending?: boolean;
  mt?: string;
}

/** The foot of every dialog: the form-level error, then Cancel and the action, right-aligned. */
export function DialogActions(props: DialogActionsProps) {
  return (
    <>
      {props.error ? (
        <Alert color="fail" variant="light" role="alert">
          {props.error}
        </Alert>
      ) : null}
      <Group justify="flex-end" mt={props.mt}>
        <Button
          variant="default"
          onClick={props.onCancel}
          disabled={props.holdCancelWhilePending && props.pending}
        >
          Cancel
        </Button>
        <Button
          type={props.onConfirm ? 'button' : 'submit'}
          onClick={props.onConfirm}
          loading={props.pending}
          disabled={props.confirmDisabled}
          color={props.confirmColor}
        >
          {props.confirmLabel}
        </Button>
      </Group>
    </>
  );
}
