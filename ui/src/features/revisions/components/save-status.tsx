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
}: {
  status: SaveStatus;
  lastSavedAt: Date | null;
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
      </Text>
    </Group>
  );
}
