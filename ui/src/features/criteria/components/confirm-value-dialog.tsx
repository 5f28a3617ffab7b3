import { useEffect, useState } from 'react';
import { Modal, Stack, Text, TextInput } from '@mantine/core';
import { DialogActions } from '../../../components/dialog-actions';
import type { CriterionValueInput } from '@holdfast/shared';
import { errorMessage, isApiRequestError } from '../../../lib/api-client';
import { useConfirmCriterion } from '../api/confirm-criterion';

export interface ConfirmValueDialogProps {
  setId: string;
  version: number;
  value: CriterionValueInput | null;
  onClose: () => void;
}

/** Confirm one value against a document the plant holds: which document, which clause. */
export function ConfirmValueDialog({ setId, version, value, onClose }: ConfirmValueDialogProps) {
  const confirm = useConfirmCriterion(setId, version);
  const [document, setDocument] = useState('');
  const [clause, setClause] = useState('');
  useEffect(() => {
    setDocument('');
    setClause('');
    confirm.reset();
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [value?.key]);
  const fields = isApiRequestError(confirm.error) ? confirm.error.fieldErrors() : {};
  const submit = () => {
    if (!value) return;
    confirm.mutate({ key: value.key, document, clause }, { onSuccess: onClose });
  };
  return (
    <Modal opened={!!value} onClose={onClose} title="Confirm against a document" size="lg">
      {value ? (
        <Stack gap="sm">
          <Text size="sm">
            {value.label}: <b>{value.value}</b> {value.unit}. Name the document the plant holds and
            the clause that gives this value. Your name and today’s date are recorded with it; it
            replaces “from memory” on screen and on paper while the value stays the same.
          </Text>
          <TextInput
            label="Document (title, number, edition)"
            required
            data-autofocus
            value={document}
            onChange={(e) => setDocument(e.currentTarget.value)}
            error={fields.document}
          />
          <TextInput
            label="Clause, table or page"
            required
            value={clause}
            onChange={(e) => setClause(e.currentTarget.value)}
            error={fields.clause}
          />
          <DialogActions
            error={
              confirm.isError && !fields.document && !fields.clause
                ? errorMessage(confirm.error)
                : null
            }
            onCancel={onClose}
            confirmLabel="Record confirmation"
            onConfirm={submit}
            pending={confirm.isPending}
          />
        </Stack>
      ) : null}
    </Modal>
  );
}
