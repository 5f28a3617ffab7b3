import { useEffect, useState, type ReactNode } from 'react';
import { Modal, Stack, Textarea } from '@mantine/core';
import { DialogActions } from './dialog-actions';
import { errorMessage, isApiRequestError } from '../lib/api-client';

export interface ActionDialogProps {
  opened: boolean;
  onClose: () => void;
  title: string;
  /** Explanation above the text box. */
  intro: ReactNode;
  textLabel: string;
  textDescription?: string;
  /** The server's field name for the text (errors on it are shown under the box). */
  textField: string;
  textRequired: boolean;
  requiredMessage: string;
  confirmLabel: string;
  confirmColor?: string;
  onConfirm: (text: string) => Promise<unknown>;
}

/**
 * A confirm dialog with one text box (justification, approval note, return comment). Focus goes
 * to the box on open and back to the button that opened it on close; server field errors land
 * under the box, anything else above the buttons.
 */
export function ActionDialog(props: ActionDialogProps) {
  const { opened, onClose, textRequired } = props;
  const [text, setText] = useState('');
  const [fieldError, setFieldError] = useState<string | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  useEffect(() => {
    if (opened) {
      setText('');
      setFieldError(null);
      setFormError(null);
    }
  }, [opened]);

  const confirm = async () => {
    if (textRequired && !text.trim()) {
      setFieldError(props.requiredMessage);
      return;
    }
    setBusy(true);
    setFieldError(null);
    setFormError(null);
    try {
      await props.onConfirm(text.trim());
      onClose();
    } catch (error) {
      const onField = isApiRequestError(error) ? error.fieldErrors()[props.textField] : undefined;
      if (onField) setFieldError(onField);
      else setFormError(errorMessage(error));
    } finally {
      setBusy(false);
    }
  };

  return (
    <Modal opened={opened} onClose={busy ? () => undefined : onClose} title={props.title} size="lg">
      <Stack gap="md">
        {props.intro}
        <Textarea
          label={props.textLabel}
          description={props.textDescription}
          required={textRequired}
          rows={3}

          value={text}
          onChange={(e) => setText(e.currentTarget.value)}
          error={fieldError}
          data-autofocus
          maxLength={4000}
        />
        <DialogActions
          error={formError}
          onCancel={onClose}
          holdCancelWhilePending
          confirmLabel={props.confirmLabel}
          confirmColor={props.confirmColor}
          onConfirm={() => void confirm()}
          pending={busy}
        />
      </Stack>
    </Modal>
  );
}
