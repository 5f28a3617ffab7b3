import { useEffect, useState } from 'react';
import { Group, Modal, Stack, Text, TextInput, Textarea } from '@mantine/core';
import { DialogActions } from '../../../components/dialog-actions';
import type { CriterionValueInput } from '@holdfast/shared';
import { errorMessage, isApiRequestError } from '../../../lib/api-client';
import { useCreateCriteriaSet } from '../api/create-criteria-set';
import { CriteriaValuesTable } from './criteria-values-table';

export interface CreateCriteriaSetDialogProps {
  opened: boolean;
  onClose: () => void;
  /** Values to start from (the set on screen); every one keeps its source until edited. */
  startFrom: CriterionValueInput[];
  startName: string;
  onCreated: (id: string) => void;
}

/** Errors on `values.<i>.<field>` keyed as `<i>.<field>`, for the values table. */
function valueErrors(fields: Record<string, string>): Record<string, string> {
  return Object.fromEntries(
    Object.entries(fields)
      .filter(([k]) => k.startsWith('values.'))
      .map(([k, m]) => [k.slice('values.'.length), m]),
  );
}

/** An admin's own criteria set (e.g. the plant standard), each value with its source. */
export function CreateCriteriaSetDialog(props: CreateCriteriaSetDialogProps) {
  const { opened, onClose, startFrom, startName, onCreated } = props;
  const create = useCreateCriteriaSet();
  const [id, setId] = useState('');
  const [name, setName] = useState('');
  const [description, setDescription] = useState('');
  const [note, setNote] = useState('');
  const [values, setValues] = useState<CriterionValueInput[]>([]);
  useEffect(() => {
    if (!opened) return;
    setId('');
    setName('');
    setDescription('');
    setNote('');
    setValues(startFrom.map((v) => ({ ...v })));
    create.reset();
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [opened]);
  const fields = isApiRequestError(create.error) ? create.error.fieldErrors() : {};
  const submit = () =>
    create.mutate(
      { id, name, description, note, values },
      {
        onSuccess: (d) => {
          onClose();
          onCreated(d.id);
        },
      },
    );
  return (
    <Modal opened={opened} onClose={onClose} title="New criteria set" size="80rem">
      <Stack gap="sm">
        <Text size="sm">
          Starts from the values of “{startName}”. Change what your standard says and name the
          source of each value; a value you only remember stays marked “from memory”.
        </Text>
        <Group grow align="flex-start">
          <TextInput
            label="Id"
            description="lower-case letters, digits and hyphens"
            required
            data-autofocus
            value={id}
            onChange={(e) => setId(e.currentTarget.value)}
            error={fields.id}
          />
          <TextInput
            label="Name"
            required
            value={name}
            onChange={(e) => setName(e.currentTarget.value)}
            error={fields.name}
          />
        </Group>
        <Textarea
          label="What the set is for and which standard governs"
          required
          rows={2}
          value={description}
          onChange={(e) => setDescription(e.currentTarget.value)}
          error={fields.description}
        />
        <CriteriaValuesTable
          values={values}
          errors={valueErrors(fields)}
          onEdit={(i, patch) =>
            setValues((cur) => cur.map((v, j) => (j === i ? { ...v, ...patch } : v)))
          }
        />
        {fields.values ? (
          <Text size="sm" c="fail" role="alert">
            {fields.values}
          </Text>
        ) : null}
        <TextInput
          label="Where the values come from"
          required
          value={note}
          onChange={(e) => setNote(e.currentTarget.value)}
          error={fields.note}
        />
        <DialogActions
          error={
            create.isError && Object.keys(fields).length === 0 ? errorMessage(create.error) : null
          }
          onCancel={onClose}
          confirmLabel="Create the set"
          onConfirm={submit}
          pending={create.isPending}
        />
      </Stack>
    </Modal>
  );
}
