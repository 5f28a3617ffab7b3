import { Alert, Badge, Group, List, Text } from '@mantine/core';
import { outboxStateLabel } from '../offline/use-outbox';
import type { OutboxEntry } from '../offline/outbox-store';

const colour: Record<OutboxEntry['state'], string> = {
  saved: 'amber',
  sending: 'steel',
  sent: 'pass',
  refused: 'fail',
};

/** Where a record saved on this device stands: saved, sending, sent, or refused and why. */
export function OutboxStatus({ entry, online }: { entry: OutboxEntry; online: boolean }) {
  return (
    <Alert
      color={colour[entry.state]}
      title={
        <Group gap="xs">
          <Badge color={colour[entry.state]} data-testid="outbox-state">
            {outboxStateLabel[entry.state]}
          </Badge>
          {!online && entry.state === 'saved' && (
            <Text size="sm">No connection: it is sent when the connection returns.</Text>
          )}
        </Group>
      }
    >
      {entry.state === 'refused' && (
        <>
          <Text size="sm">{entry.message}</Text>
          <List size="sm">
            {(entry.fields ?? []).map((f) => (
              <List.Item key={f.path}>
                {f.path}: {f.message}
              </List.Item>
            ))}
          </List>
        </>
      )}
      {entry.state === 'saved' && entry.message && online && (
        <Text size="sm">Last try: {entry.message}</Text>
      )}
    </Alert>
  );
}
