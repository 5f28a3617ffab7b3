import { useState } from 'react';
import { Alert, Button, List, Text } from '@mantine/core';
import { IconAlertTriangle, IconUserQuestion } from '@tabler/icons-react';
import { fieldRecordKindLabels } from '@holdfast/shared';
import type { OutboxOwner } from '../offline/outbox-store';
import { ownerName, waitingText } from '../offline/outbox-summary';
import { useDeviceOutbox } from '../offline/use-device-outbox';
import { isoDayTime } from '../../../lib/dates';

/**
 * Shown in the signed-in frame. Sends the signed-in user's own entries (through the hook) and
 * says plainly what other people left on this shared device: whose, how many, and that they go
 * only under their own name. Entries from before owners were stored are offered to the user to
 * claim; nothing is sent or deleted behind anyone's back.
 */
export function DeviceOutboxNotice({ user }: { user: OutboxOwner }) {
  const { summary, claimUnassigned } = useDeviceOutbox(user);
  const [claiming, setClaiming] = useState(false);
  const [failed, setFailed] = useState<string | null>(null);
  const { others, unassigned } = summary;
  if (others.length === 0 && unassigned.length === 0) return null;

  async function claim() {
    setClaiming(true);
    setFailed(null);
    try {
      await claimUnassigned(unassigned.map((e) => e.id));
    } catch (error) {
      setFailed(error instanceof Error ? error.message : String(error));
    } finally {
      setClaiming(false);
    }
  }

  return (
    <>
      {others.length > 0 && (
        <Alert
          color="amber"
          variant="light"
          mb="md"
          icon={<IconAlertTriangle aria-hidden />}
          title="Entries of another person are waiting on this device"
          data-testid="others-outbox-notice"
        >
          <List size="sm">
            {others.map((o) => (
              <List.Item key={o.owner.id}>
                {`${ownerName(o.owner)}: ${waitingText(o)}, sent when ${o.owner.displayName} signs in on this device.`}
              </List.Item>
            ))}
          </List>
          <Text size="sm" mt={4}>
            They are not sent under your name and stay on this device until then.
          </Text>
        </Alert>
      )}
      {unassigned.length > 0 && (
        <Alert
          color="steel"
          variant="light"
          mb="md"
          icon={<IconUserQuestion aria-hidden />}
          title="Unassigned entries on this device"
          data-testid="unassigned-outbox-notice"
        >
          <Text size="sm">
            {`${waitingText(summary.unassignedWaiting)} ${unassigned.length === 1 ? 'was' : 'were'} saved here before Holdfast kept who saved each entry. They are sent only when the person who made them confirms they are theirs.`}
          </Text>
          <List size="sm" mt={4}>
            {unassigned.map((e) => (
              <List.Item key={e.id}>
                {`${fieldRecordKindLabels[e.payload.kind]}, ${isoDayTime(e.payload.performedAt)}${e.payload.findings ? `: ${e.payload.findings}` : ''}`}
              </List.Item>
            ))}
          </List>
          <Button mt="sm" size="sm" loading={claiming} onClick={() => void claim()}>
            {`They are mine: send them as ${ownerName(user)}`}
          </Button>
          {failed && (
            <Text size="sm" c="fail" mt={4}>
              {failed}
            </Text>
          )}
        </Alert>
      )}
    </>
  );
}
