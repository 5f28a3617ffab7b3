import { useEffect, useState } from 'react';
import { Modal, Select, Stack, TextInput } from '@mantine/core';
import { DialogActions } from '../../../components/dialog-actions';
import { errorMessage, isApiRequestError } from '../../../lib/api-client';
import { useSaveRegisterItem, type RegisterKind } from '../api/save-register-item';

export interface RegisterField {
  name: string;
  label: string;
  description?: string;
  placeholder?: string;
  required?: boolean;
  /** A choice from these options instead of free text. */
  options?: { value: string; label: string }[];
}

export interface RegisterFormDialogProps {
  opened: boolean;
  onClose: () => void;
  title: string;
  kind: RegisterKind;
  /** The record to edit; absent to add one. */
  id?: string;
  fields: RegisterField[];
  /** Starting values (the record's, or empty). */
  initial: Record<string, string>;
  /** Sent as they are (e.g. the parent id of a new record). */
  fixed?: Record<string, string>;
  confirmLabel: string;
}

/**
 * One form for adding or editing a site, machine or brake position. The server validates with
 * the shared schema; its field errors land under their fields, anything else above the buttons.
 */
export function RegisterFormDialog(props: RegisterFormDialogProps) {
  const { opened, onClose, title, kind, id, fields, initial, fixed, confirmLabel } = props;
  const [values, setValues] = useState(initial);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [formError, setFormError] = useState<string | null>(null);
  const save = useSaveRegisterItem();

  useEffect(() => {
    if (opened) {
      setValues(initial);
      setErrors({});
      setFormError(null);
    }
    // Reset only when the dialog opens, not on every render of a new `initial` object.
  }, [opened]); // eslint-disable-line react-hooks/exhaustive-deps

  const submit = async () => {
    const missing = fields.filter((f) => f.required && !values[f.name]?.trim());
    if (missing.length > 0) {
      setErrors(Object.fromEntries(missing.map((f) => [f.name, 'Required.'])));
      return;
    }
    // An edit sends only what changed, so a stale form cannot undo someone else's edit.
    const changed = fields.filter((f) => (values[f.name] ?? '') !== (initial[f.name] ?? ''));
    const body = id
      ? Object.fromEntries(changed.map((f) => [f.name, values[f.name] ?? '']))
      : { ...fixed, ...Object.fromEntries(fields.map((f) => [f.name, values[f.name] ?? ''])) };
    if (id && changed.length === 0) {
      onClose();
      return;
    }
    try {
      await save.mutateAsync({ kind, id, body });
      onClose();
    } catch (e) {
      const fieldErrors = isApiRequestError(e) ? e.fieldErrors() : {};
      if (Object.keys(fieldErrors).length > 0) setErrors(fieldErrors);
      setFormError(fieldErrors[''] ?? (Object.keys(fieldErrors).length ? null : errorMessage(e)));
    }
  };

  return (
    <Modal opened={opened} onClose={onClose} title={title}>
      <form
        onSubmit={(e) => {
          e.preventDefault();
          void submit();
        }}
      >
        <Stack gap="sm">
          {fields.map((f, i) =>
            f.options ? (
              <Select
                key={f.name}
                label={f.label}
                description={f.description}
                data={f.options}
                value={values[f.name] || null}
                onChange={(v) => setValues((s) => ({ ...s, [f.name]: v ?? '' }))}
                error={errors[f.name]}
                withAsterisk={f.required}
                allowDeselect={false}
                data-autofocus={i === 0 || undefined}
              />
            ) : (
              <TextInput
                key={f.name}
                label={f.label}
                description={f.description}
                placeholder={f.placeholder}
                value={values[f.name] ?? ''}
                onChange={(e) => {
                  const v = e.currentTarget.value;
                  setValues((s) => ({ ...s, [f.name]: v }));
                }}
                error={errors[f.name]}
                withAsterisk={f.required}
                data-autofocus={i === 0 || undefined}
              />
            ),
          )}
          <DialogActions
            error={formError}
            onCancel={onClose}
            confirmLabel={confirmLabel}
            pending={save.isPending}
          />
        </Stack>
      </form>
    </Modal>
  );
}
