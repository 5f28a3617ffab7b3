import { Group, Loader, Text } from '@mantine/core';
import { IconAlertTriangle, IconCheck, IconPencil } from '@tabler/icons-react';
import type { SaveStatus } from '../hooks/use-draft-autosave';

const TEXT: Record<SaveStatus, string> = {
  saved: 'All changes saved',
  unsaved: 'Unsaved changes',
  saving: 'Saving…',
  error: 'Not saved',
  conflict: 'Changed elsewhere — not saved',
};

/** Where the draft stands against the server, in words. */
export function SaveStatusText({
  status,
  lastSavedAt,
  heldBack = 0,
}: {
  status: SaveStatus;
  lastSavedAt: Date | null;
  /** Invalid fields left out of the last save (their text stays on screen and on the device). */
  heldBack?: number;
}) {
  const icon =
    status === 'saving' ? (
      <Loader size={12} />
    ) : status === 'saved' ? (
      <IconCheck size={14} aria-hidden />
    ) : status === 'unsaved' ? (
      <IconPencil size={14} aria-hidden />
    ) : (
      <IconAlertTriangle size={14} aria-hidden color="var(--mantine-color-fail-7)" />
    );
  return (
    <Group gap={4} role="status" aria-live="polite" data-save-status={status}>
      {icon}
      <Text size="xs" c={status === 'error' || status === 'conflict' ? 'fail.8' : 'dimmed'}>
        {TEXT[status]}
        {status === 'saved' && lastSavedAt ? ` at ${lastSavedAt.toLocaleTimeString('en-GB')}` : ''}
        {status === 'saved' && heldBack > 0
          ? ` except ${heldBack === 1 ? 'one field' : `${heldBack} fields`} still to correct (kept on this device)`
          : ''}
      </Text>
    </Group>
  );
}
