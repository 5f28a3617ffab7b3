import { Skeleton } from '@mantine/core';
import type { QueryClient } from '@tanstack/react-query';
import { Suspense } from 'react';
import { data } from 'react-router-dom';
import { Page } from '../../../components/layouts/page';
import { getFailedMailQueryOptions } from '../../../features/admin/api/failed-mail';
import { FailedMailTable } from '../../../features/admin/components/failed-mail-table';
import { hasRole, sessionStore } from '../../../lib/session';
import type { RouteHandle } from '../../../lib/route-handle';

export const handle: RouteHandle = { title: 'Undelivered mail' };

export const clientLoader = (queryClient: QueryClient) => async () => {
  if (!hasRole(sessionStore.getState().user, 'admin'))
    throw data('Only administrators see undelivered mail.', { status: 403 });
  await queryClient.ensureQueryData(getFailedMailQueryOptions());
  return null;
};

export function Component() {
  return (
    <Page
      title="Undelivered mail"
      description="Notifications the mail server refused through every retry. Fix the cause (address, relay), then send them again."
    >
      <Suspense fallback={<Skeleton h={120} />}>
        <FailedMailTable />
      </Suspense>
    </Page>
  );
}
