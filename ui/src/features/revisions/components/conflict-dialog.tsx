import { memo, useState } from 'react';
import { Button, Group, Modal, Stack, Text } from '@mantine/core';

export interface ConflictDialogProps {
  opened: boolean;
  onTakeTheirs: () => Promise<void>;
  onKeepMine: () => Promise<void>;
}

/**
 * Someone saved this draft after you opened it. Nothing is merged silently: the user picks whose
 * inputs stay, and the other side is replaced.
 */
export const ConflictDialog = memo(function ConflictDialog({
  opened,
  onTakeTheirs,
  onKeepMine,
}: ConflictDialogProps) {
  const [busy, setBusy] = useState<'theirs' | 'mine' | null>(null);
  const run = async (which: 'theirs' | 'mine') => {
    setBusy(which);
    try {
      await (which === 'theirs' ? onTakeTheirs() : onKeepMine());
    } finally {
      setBusy(null);
    }
  };
  return (
    <Modal
      opened={opened}
      onClose={() => undefined}
      withCloseButton={false}
      closeOnClickOutside={false}
      closeOnEscape={false}
      title="This draft was changed elsewhere"
    >
      <Stack gap="md">
        <Text size="sm">
          Someone (or you, in another tab) saved this draft after you opened it. Your latest edits
          are still here but were not saved.
        </Text>
        <Text size="sm">
          <strong>Load their version</strong> discards your unsaved edits.{' '}
          <strong>Keep mine</strong> saves your inputs over theirs as a new save.
        </Text>
        <Group justify="flex-end">
          <Button
            variant="default"
            loading={busy === 'theirs'}
            disabled={busy !== null}
            onClick={() => run('theirs')}
            data-autofocus
          >
            Load their version
          </Button>
          <Button loading={busy === 'mine'} disabled={busy !== null} onClick={() => run('mine')}>
            Keep mine
          </Button>
        </Group>
      </Stack>
    </Modal>
  );
});
