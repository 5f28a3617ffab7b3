import { SimpleGrid, Skeleton } from '@mantine/core';
import type { QueryClient } from '@tanstack/react-query';
import { Page } from '../../../components/layouts/page';
import { ErrorPanel } from '../../../components/errors/error-panel';
import type { RouteHandle } from '../../../lib/route-handle';
import { useCurrentUser } from '../../../lib/session';
import { useWorkQueue, workQueueQueryOptions } from '../../../features/queue/api/get-work-queue';
import { QueueSection } from '../../../features/queue/components/queue-section';
import { StateBadge } from '../../../features/sheets/components/state-badge';
import { UnderReviewQueue } from '../../../features/criteria-review/components/under-review-queue';
import { DueInspectionsPanel } from '../../../features/field-records/components/due-inspections';
import { AdminQueue, queueSections, roleLine } from './queue-sections';

export const handle: RouteHandle = { title: 'Work queue' };

export function clientLoader(queryClient: QueryClient) {
  return async () => {
    await queryClient.ensureQueryData(workQueueQueryOptions());
    return null;
  };
}

export function Component() {
  const user = useCurrentUser();
  const queue = useWorkQueue();
  const first = user.displayName.split(' ')[0];
  return (
    <Page
      title="Work queue"
      description={`What is waiting for you, ${first}. ${roleLine[user.role]}`}
    >
      {queue.isPending ? (
        <SimpleGrid cols={{ base: 1, md: 2 }}>
          {[0, 1, 2, 3].map((i) => (
            <Skeleton key={i} h={160} />
          ))}
        </SimpleGrid>
      ) : queue.isError ? (
        <ErrorPanel error={queue.error} onRetry={() => void queue.refetch()} />
      ) : (
        <SimpleGrid cols={{ base: 1, md: 2 }} spacing="md">
          <UnderReviewQueue />
          {user.role !== 'admin' ? <DueInspectionsPanel /> : null}
          {queueSections(user.role).map((section) => (
            <QueueSection
              key={section.id}
              id={section.id}
              title={section.title}
              empty={section.empty}
              items={queue.data[section.list]}
              renderState={(i) => <StateBadge state={i.state} size="xs" />}
            />
          ))}
          {user.role === 'admin' ? <AdminQueue /> : null}
        </SimpleGrid>
      )}
    </Page>
  );
}
