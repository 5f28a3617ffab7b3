import { Anchor, Badge, Group, Paper, Skeleton, Stack, Text, Title } from '@mantine/core';
import { Link } from 'react-router-dom';
import { useUnderReviewQueue } from '../api/get-under-review-queue';
import { isoDay } from '../../../lib/dates';

/**
 * Approved sheets I own or checked that a newer criteria version makes fail. Hidden when there
 * are none, so the work queue stays as it was for most people.
 */
export function UnderReviewQueue() {
  const queue = useUnderReviewQueue();
  if (queue.isPending) return <Skeleton h={80} />;
  if (queue.isError || queue.data.items.length === 0) return null;
  const items = queue.data.items;
  return (
    <Paper p="md" component="section" aria-labelledby="under-review" data-queue="under-review">
      <Group justify="space-between" mb="sm">
        <Title order={2} size="h5" id="under-review">
          Approvals under review
        </Title>
        <Badge variant="light" color="fail" size="lg" aria-label={`${items.length} items`}>
          {items.length}
        </Badge>
      </Group>
      <Stack gap={6} component="ul" p={0} m={0} style={{ listStyle: 'none' }}>
        {items.map((item) => (
          <li key={item.revisionId}>
            <Anchor
              component={Link}
              to={`/sheets/${item.sheetId}/revisions/${item.revisionId}`}
              size="sm"
              fw={500}
            >
              <Text span ff="monospace" size="sm">
                {item.documentNumber}
              </Text>{' '}
              rev. {item.revisionLabel} {item.title}
            </Anchor>
            <Text size="xs" c="dimmed">
              since {isoDay(item.flaggedAt)}: criteria {item.criteriaSetName} v
              {item.criteriaSetVersion}
            </Text>
          </li>
        ))}
      </Stack>
    </Paper>
  );
}
