import { Paper } from '@mantine/core';
import { useCurrentUser } from '../../../lib/session';
import { useUsers } from '../api/get-users';
import { UsersTable } from './users-table';

/** The user list, read through Suspense (the route loader has usually fetched it already). */
export function UsersPanel() {
  const me = useCurrentUser();
  const { data } = useUsers();
  return (
    <Paper p={0}>
      <UsersTable users={data.items} currentUserId={me.id} />
    </Paper>
  );
}
