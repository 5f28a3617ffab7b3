import { Radio, Select, Stack, Text } from '@mantine/core';
import type { SheetStart } from '@holdfast/shared';
import { useSheets } from '../api/get-sheets';
import type { SheetListParams } from '../../../lib/query-keys';

export type StartKind = SheetStart['kind'];

export interface SheetStartPickerProps {
  sheetType: string | null;
  kind: StartKind;
  onKind: (kind: StartKind) => void;
  copyFrom: string | null;
  onCopyFrom: (revisionId: string | null) => void;
  error?: string;
}

/**
 * How the first revision starts: blank, a copy of an approved sheet, or the example duty marked
 * as an example. Copied and example values stay marked until the engineer confirms each one.
 */
export function SheetStartPicker(props: SheetStartPickerProps) {
  const { sheetType, kind } = props;
  const approved = useSheets({
    sheetType: (sheetType ?? undefined) as SheetListParams['sheetType'],
    pageSize: 200,
  });
  const sources = (approved.data?.items ?? [])
    .filter((s) => s.approved)
    .map((s) => ({
      value: s.approved!.id,
      label: `${s.documentNumber} rev ${s.approved!.label} · ${s.position.tag} · ${s.title}`,
    }));
  return (
    <Stack gap="xs">
      <Radio.Group
        label="Start from"
        value={kind}
        onChange={(v) => props.onKind(v as StartKind)}
        required
      >
        <Stack gap={8} mt={6}>
          <Radio
            value="empty"
            label="An empty sheet"
            description="Every value blank until you enter it (choices start at the usual option, marked until confirmed)."
          />
          <Radio
            value="copy"
            label="A copy of an approved sheet"
            description="Another position’s approved values, each marked until you confirm it for this brake."
          />
          <Radio
            value="example"
            label="The example duty"
            description="An invented demonstration duty. Every value is marked as an example until you change or confirm it."
          />
        </Stack>
      </Radio.Group>
      {kind === 'copy' ? (
        <Select
          label="Approved sheet to copy"
          placeholder={approved.isPending ? 'Loading…' : 'Choose an approved sheet'}
          data={sources}
          value={props.copyFrom}
          onChange={props.onCopyFrom}
          searchable
          required
          error={props.error}
          nothingFoundMessage="No approved sheet of this type yet"
        />
      ) : null}
      {kind === 'copy' && !approved.isPending && sources.length === 0 ? (
        <Text size="xs" c="dimmed">
          There is no approved sheet of this type to copy yet.
        </Text>
      ) : null}
    </Stack>
  );
}
