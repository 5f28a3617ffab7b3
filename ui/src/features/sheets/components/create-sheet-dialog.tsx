import { useEffect, useState } from 'react';
import { Modal, Select, Stack, TextInput } from '@mantine/core';
import { DialogActions } from '../../../components/dialog-actions';
import {
  createSheetSchema,
  sheetTypeIds,
  toFieldIssues,
  type SheetDetail,
  type SheetTypeId,
} from '@holdfast/shared';
import { errorMessage, isApiRequestError } from '../../../lib/api-client';
import { sentence } from '../../../lib/sentence';
import { sheetTypeTitle } from '../../../components/calc/utils/sheet-types';
import { OpenSheetWarning } from '../../register/components/open-sheet-warning';
import { useCreateSheet } from '../api/create-sheet';
import { SheetStartPicker, type StartKind } from './sheet-start-picker';

/** An empty title is a missing one: say so, rather than ask for 3 characters of nothing. */
function titleMessage(title: string, message: string): string {
  return title.trim() === '' ? 'Required: enter a title' : sentence(message);
}

export interface PositionGroup {
  group: string;
  items: { value: string; label: string }[];
}

export interface CreateSheetDialogProps {
  opened: boolean;
  onClose: () => void;
  positions: PositionGroup[];
  onCreated: (sheet: SheetDetail) => void;
  /** The position to start on (from "Start a sheet" on the equipment page). */
  initialPositionId?: string | null;
  /** The sheet type a position most likely needs; picked for the engineer until they choose one. */
  sheetTypeFor?: (positionId: string) => SheetTypeId | null;
}

/** A new sheet for one brake position: revision A starts as a draft, blank, copied or the example. */
export function CreateSheetDialog({
  opened,
  onClose,
  positions,
  onCreated,
  initialPositionId = null,
  sheetTypeFor,
}: CreateSheetDialogProps) {
  const [positionId, setPositionId] = useState<string | null>(null);
  const [sheetType, setSheetType] = useState<string | null>('hoist-shoe-brake');
  // Once the engineer picks a sheet type, a change of position no longer overrides it.
  const [typeChosen, setTypeChosen] = useState(false);
  const [title, setTitle] = useState('');
  const [startKind, setStartKind] = useState<StartKind>('empty');
  const [copyFrom, setCopyFrom] = useState<string | null>(null);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const create = useCreateSheet();

  const pickPosition = (id: string | null, keepType = typeChosen) => {
    setPositionId(id);
    const suggested = id && !keepType ? sheetTypeFor?.(id) : null;
    if (suggested) setSheetType(suggested);
  };

  useEffect(() => {
    if (!opened) return;
    setErrors({});
    // Each opening suggests afresh: a type picked for an earlier sheet says nothing of this one.
    setTypeChosen(false);
    if (initialPositionId) pickPosition(initialPositionId, false);
    // Only opening the dialog (with or without a position to start on) resets it.
  }, [opened, initialPositionId]); // eslint-disable-line react-hooks/exhaustive-deps

  const submit = () => {
    if (startKind === 'copy' && !copyFrom) {
      setErrors({ 'start.revisionId': 'Choose the approved sheet to copy' });
      return;
    }
    const parsed = createSheetSchema.safeParse({
      title,
      positionId: positionId ?? '',
      sheetType: sheetType ?? '',
      start: startKind === 'copy' ? { kind: 'copy', revisionId: copyFrom } : { kind: startKind },
    });
    if (!parsed.success) {
      const map: Record<string, string> = {};
      for (const issue of toFieldIssues(parsed.error))
        map[issue.path] ??=
          issue.path === 'positionId'
            ? 'Choose a brake position'
            : issue.path === 'title'
              ? titleMessage(title, issue.message)
              : sentence(issue.message);
      setErrors(map);
      return;
    }
    setErrors({});
    create.mutate(parsed.data, {
      onSuccess: (sheet) => {
        setTitle('');
        onCreated(sheet);
      },
      onError: (e) => {
        if (isApiRequestError(e) && e.fields.length > 0) setErrors(e.fieldErrors());
        else setErrors({ form: errorMessage(e) });
      },
    });
  };

  return (
    <Modal opened={opened} onClose={onClose} title="New calculation sheet" size="lg">
      <Stack>
        <Select
          label="Brake position"
          description="Site › machine › position, from the equipment register"
          placeholder="Choose a position"
          data={positions}
          value={positionId}
          onChange={(id) => pickPosition(id)}
          searchable
          required
          error={errors.positionId}
          nothingFoundMessage="No position matches"
          data-autofocus
        />
        <Select
          label="Sheet type"
          data={sheetTypeIds.map((id) => ({ value: id, label: sheetTypeTitle(id) }))}
          value={sheetType}
          onChange={(v) => {
            setSheetType(v);
            setTypeChosen(true);
          }}
          allowDeselect={false}
          required
          error={errors.sheetType}
        />
        <OpenSheetWarning positionId={positionId} sheetType={sheetType} />
        <TextInput
          label="Title"
          placeholder="e.g. Main hoist service brake, heavier ladle"
          value={title}
          onChange={(e) => setTitle(e.currentTarget.value)}
          required
          error={errors.title ?? errors.form}
        />
        <SheetStartPicker
          sheetType={sheetType}
          kind={startKind}
          onKind={setStartKind}
          copyFrom={copyFrom}
          onCopyFrom={setCopyFrom}
          error={errors['start.revisionId']}
        />
        <DialogActions
          onCancel={onClose}
          confirmLabel="Create sheet"
          onConfirm={submit}
          pending={create.isPending}
        />
      </Stack>
    </Modal>
  );
}
