import { Anchor, Group, Text, Timeline } from '@mantine/core';
import { Link } from 'react-router-dom';
import type { RevisionSummary } from '@holdfast/shared';
import { StateBadge } from './state-badge';
import { isoDayTime } from '../../../lib/dates';

const when = (iso: string | null) => (iso ? isoDayTime(iso) : null);

/** A sheet's revisions, newest first, with who did what and when. */
export function RevisionTimeline({
  sheetId,
  revisions,
  selectedId,
}: {
  sheetId: string;
  revisions: RevisionSummary[];
  selectedId?: string;
}) {
  const newestFirst = [...revisions].reverse();
  const active = newestFirst.findIndex((r) => r.id === selectedId);
  return (
    <Timeline active={active} bulletSize={22} lineWidth={2} aria-label="Revision history">
      {newestFirst.map((r) => (
        <Timeline.Item
          key={r.id}
          bullet={
            <Text size="xs" fw={700}>
              {r.label}
            </Text>
          }
          title={
            <Group gap="xs">
              <Anchor
                component={Link}
                to={`/sheets/${sheetId}/revisions/${r.id}`}
                fw={600}
                size="sm"
              >
                Revision {r.label}
              </Anchor>
              <StateBadge state={r.state} size="xs" />
            </Group>
          }
        >
          {r.changeNote ? (
            <Text size="sm" mt={2}>
              {r.changeNote}
            </Text>
          ) : null}
          <Text size="xs" c="dimmed" mt={2}>
            Started by {r.author.displayName}, {when(r.createdAt)}
          </Text>
          {r.submittedAt ? (
            <Text size="xs" c="dimmed">
              Sent for check {when(r.submittedAt)}
            </Text>
          ) : null}
          {r.returnedAt ? (
            <Text size="xs" c="dimmed">
              Returned{r.checker ? ` by ${r.checker.displayName}` : ''} {when(r.returnedAt)}
            </Text>
          ) : null}
          {r.approvedAt ? (
            <Text size="xs" c="dimmed">
              Approved{r.checker ? ` by ${r.checker.displayName}` : ''} {when(r.approvedAt)}
            </Text>
          ) : null}
        </Timeline.Item>
      ))}
    </Timeline>
  );
}
