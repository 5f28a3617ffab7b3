import { useState } from 'react';
import { Modal, Stack, Text, TextInput } from '@mantine/core';
import { DialogActions } from '../../../components/dialog-actions';
import { errorMessage, isApiRequestError } from '../../../lib/api-client';
import { useCreateRevision } from '../api/create-revision';

export interface NewRevisionDialogProps {
  sheetId: string;
  opened: boolean;
  onClose: () => void;
  onCreated: (revisionId: string) => void;
}

/** Starts the next revision from a copy of the latest inputs; the change note says why. */
export function NewRevisionDialog({ sheetId, opened, onClose, onCreated }: NewRevisionDialogProps) {
  const [note, setNote] = useState('');
  const create = useCreateRevision(sheetId);
  const fieldError = isApiRequestError(create.error)
    ? create.error.fieldErrors().changeNote
    : undefined;
  const submit = () => {
    if (!note.trim()) return;
    create.mutate(
      { changeNote: note.trim() },
      {
        onSuccess: (r) => {
          setNote('');
          onCreated(r.id);
        },
      },
    );
  };
  return (
    <Modal opened={opened} onClose={onClose} title="Start a new revision">
      <Stack>
        <Text size="sm">
          The new revision starts as a draft with the inputs of the latest revision. The approved
          revision stays in force until the new one is approved.
        </Text>
        <TextInput
          label="Why the sheet changes"
          required
          value={note}
          onChange={(e) => setNote(e.currentTarget.value)}
          onKeyDown={(e) => e.key === 'Enter' && submit()}
          error={
            fieldError ?? (create.isError && !fieldError ? errorMessage(create.error) : undefined)
          }
          data-autofocus
        />
        <DialogActions
          onCancel={onClose}
          confirmLabel="Start revision"
          onConfirm={submit}
          pending={create.isPending}
          confirmDisabled={!note.trim()}
        />
      </Stack>
    </Modal>
  );
}
