import type { ReactNode } from 'react';
import { Anchor, Group, Paper, Stack, Text } from '@mantine/core';
import { Link } from 'react-router-dom';
import type { QueueItem } from '@holdfast/shared';
import { isoDay } from '../../../lib/dates';
import { CountedTitle } from '../../../components/counted-title';

export interface QueueSectionProps {
  id: string;
  title: string;
  empty: string;
  items: QueueItem[];
  /** Renders the state of an item (a badge). */
  renderState: (item: QueueItem) => ReactNode;
}

/** One list of the work queue with its count. */
export function QueueSection({ id, title, empty, items, renderState }: QueueSectionProps) {
  return (
    <Paper p="md" component="section" aria-labelledby={id} data-queue={id}>
      <CountedTitle id={id} title={title} count={items.length} />
      {items.length === 0 ? (
        <Text size="sm" c="dimmed">
          {empty}
        </Text>
      ) : (
        <Stack gap={6} component="ul" p={0} m={0} style={{ listStyle: 'none' }}>
          {items.map((item) => (
            <li key={item.revisionId}>
              <Group justify="space-between" wrap="nowrap" gap="xs">
                <div style={{ minWidth: 0 }}>
                  <Anchor
                    component={Link}
                    to={`/sheets/${item.sheetId}/revisions/${item.revisionId}`}
                    size="sm"
                    fw={500}
                  >
                    <Text span ff="monospace" size="sm">
                      {item.documentNumber}
                    </Text>{' '}
                    rev. {item.revisionLabel}
                  </Anchor>
                  <Text size="xs" c="dimmed">
                    {item.title} · {item.author.displayName} ·{' '}
                    <span style={{ whiteSpace: 'nowrap' }}>{isoDay(item.updatedAt)}</span>
                  </Text>
                </div>
                {renderState(item)}
              </Group>
            </li>
          ))}
        </Stack>
      )}
    </Paper>
  );
}
