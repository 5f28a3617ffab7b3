import { Suspense } from 'react';
import { Button, Skeleton, Stack } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconUserPlus } from '@tabler/icons-react';
import type { QueryClient } from '@tanstack/react-query';
import { data } from 'react-router-dom';
import { Page } from '../../../components/layouts/page';
import { getUsersQueryOptions } from '../../../features/admin/api/get-users';
import { CreateUserDialog } from '../../../features/admin/components/create-user-dialog';
import { UsersPanel } from '../../../features/admin/components/users-panel';
import { hasRole, sessionStore } from '../../../lib/session';
import type { RouteHandle } from '../../../lib/route-handle';

export const handle: RouteHandle = { title: 'Users' };

export const clientLoader = (queryClient: QueryClient) => async () => {
  // The server refuses non-admins too; this only spares them a screen of errors.
  if (!hasRole(sessionStore.getState().user, 'admin'))
    throw data('Only administrators manage users.', { status: 403 });
  await queryClient.ensureQueryData(getUsersQueryOptions());
  return null;
};

function TableSkeleton() {
  return (
    <Stack gap="xs" aria-label="Loading users">
      {Array.from({ length: 6 }, (_, i) => (
        <Skeleton key={i} h={36} />
      ))}
    </Stack>
  );
}

export function Component() {
  const [opened, { open, close }] = useDisclosure(false);
  return (
    <Page
      title="Users"
      description="Who can sign in, and with which role. Deactivated users keep their name on the sheets they signed."
      actions={
        <Button leftSection={<IconUserPlus size={16} aria-hidden />} onClick={open}>
          New user
        </Button>
      }
    >
      <Suspense fallback={<TableSkeleton />}>
        <UsersPanel />
      </Suspense>
      <CreateUserDialog opened={opened} onClose={close} />
    </Page>
  );
}
