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
    <Page title="Work queue" description={`What is waiting for you, ${first}.`}>
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
          <QueueSection
            id="returned"
            title="Returned to me"
            empty="Nothing returned to you."
            items={queue.data.returnedToMe}
            renderState={(i) => <StateBadge state={i.state} size="xs" />}
          />
          <QueueSection
            id="check"
            title="Waiting for my check"
            empty={
              user.role === 'checker'
                ? 'No revision is waiting for your check.'
                : 'Checking is done by checkers.'
            }
            items={queue.data.awaitingMyCheck}
            renderState={(i) => <StateBadge state={i.state} size="xs" />}
          />
          <QueueSection
            id="drafts"
            title="My drafts"
            empty="You have no drafts open."
            items={queue.data.myDrafts}
            renderState={(i) => <StateBadge state={i.state} size="xs" />}
          />
          <QueueSection
            id="approved"
            title="Recently approved"
            empty="Nothing approved lately."
            items={queue.data.recentlyApproved}
            renderState={(i) => <StateBadge state={i.state} size="xs" />}
          />
        </SimpleGrid>
      )}
    </Page>
  );
}
