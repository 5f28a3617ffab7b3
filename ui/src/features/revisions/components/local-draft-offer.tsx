import { Alert, Button, Group, Text } from '@mantine/core';
import { IconDeviceFloppy } from '@tabler/icons-react';
import type { LocalOffer } from '../hooks/use-revision-draft';
import { isoDayTime } from '../../../lib/dates';

/** Offers back edits kept on this device that the server never received. */
export function LocalDraftOffer({
  offer,
  onRestore,
  onDiscard,
}: {
  offer: LocalOffer;
  onRestore: () => void;
  onDiscard: () => void;
}) {
  const when = isoDayTime(offer.draft.savedAt, true);
  const n = offer.changed.length;
  return (
    <Alert
      color="amber"
      variant="light"
      icon={<IconDeviceFloppy size={18} />}
      title="Unsaved edits on this device"
      data-testid="local-draft-offer"
    >
      <Text size="sm">
        {n === 1 ? 'One field was' : `${n} fields were`} edited here on {when} and not saved (the
        page was closed, reloaded or the session ended).
        {offer.stale
          ? ' The saved sheet has changed since: restoring puts these edits over the newer version.'
          : ''}
      </Text>
      <Group gap="xs" mt="xs">
        <Button size="xs" onClick={onRestore}>
          Restore my edits
        </Button>
        <Button size="xs" variant="default" onClick={onDiscard}>
          Discard them
        </Button>
      </Group>
    </Alert>
  );
}
