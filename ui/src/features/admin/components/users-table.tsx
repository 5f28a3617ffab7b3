import { Avatar, Badge, Button, Group, Select, Table, Text, Tooltip } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { IconCircleCheck, IconCircleOff } from '@tabler/icons-react';
import type { Role, User } from '@holdfast/shared';
import { errorMessage } from '../../../lib/api-error';
import { useUpdateUser, type UpdateUserVariables } from '../api/update-user';
import { ResetPasswordButton } from './reset-password-button';
import { roleOptions } from './role-options';
import classes from './users-table.module.css';
import { fitCellWidth, fitWidth } from '../../../lib/fit-width';

function StatusBadge({ active }: { active: boolean }) {
  return active ? (
    <Badge color="pass" leftSection={<IconCircleCheck size={12} aria-hidden />}>
      Active
    </Badge>
  ) : (
    <Badge color="gray" leftSection={<IconCircleOff size={12} aria-hidden />}>
      Deactivated
    </Badge>
  );
}

export function UsersTable({ users, currentUserId }: { users: User[]; currentUserId: string }) {
  const update = useUpdateUser();

  const change = (user: User, changes: UpdateUserVariables['changes'], what: string) =>
    update.mutate(
      { id: user.id, changes },
      {
        onSuccess: () =>
          notifications.show({ color: 'steel', title: what, message: user.displayName }),
        onError: (error) =>
          notifications.show({
            color: 'fail',
            title: `${user.displayName}: not changed`,
            message: errorMessage(error),
          }),
      },
    );

  const busy = (user: User) => update.isPending && update.variables?.id === user.id;

  return (
    <Table.ScrollContainer minWidth={840}>
      <Table verticalSpacing="xs" highlightOnHover className={classes.table}>
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Name</Table.Th>
            <Table.Th>E-mail</Table.Th>
            <Table.Th w={170}>Role</Table.Th>
            <Table.Th w={140}>Status</Table.Th>
            <Table.Th w={250}>
              <span className={classes.srOnly}>Actions</span>
            </Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {users.map((user) => {
            const self = user.id === currentUserId;
            return (
              <Table.Tr key={user.id} data-inactive={!user.active || undefined}>
                <Table.Td>
                  <Group gap="sm" wrap="nowrap">
                    <Avatar size={28} radius="sm" color={user.active ? 'steel' : 'gray'}>
                      {user.initials}
                    </Avatar>
                    <Text size="sm" fw={500}>
                      {user.displayName}
                      {self ? (
                        <Text span size="xs" c="dimmed">
                          {' '}
                          (you)
                        </Text>
                      ) : null}
                    </Text>
                  </Group>
                </Table.Td>
                <Table.Td>
                  <Text size="sm">{user.email}</Text>
                </Table.Td>
                <Table.Td
                  miw={fitCellWidth(
                    roleOptions.map((o) => o.label),
                    120,
                  )}
                >
                  <Tooltip label="You cannot change your own role" disabled={!self}>
                    <Select
                      size="xs"
                      aria-label={`Role of ${user.displayName}`}
                      data={roleOptions}
                      w={fitWidth(
                        roleOptions.map((o) => o.label),
                        120,
                      )}
                      value={user.role}
                      allowDeselect={false}
                      disabled={self || busy(user)}
                      onChange={(role) =>
                        role &&
                        role !== user.role &&
                        change(user, { role: role as Role }, 'Role changed')
                      }
                    />
                  </Tooltip>
                </Table.Td>
                <Table.Td>
                  <StatusBadge active={user.active} />
                </Table.Td>
                <Table.Td>
                  {self ? null : (
                    <Group gap={6} wrap="nowrap">
                      <ResetPasswordButton user={user} />
                      <Button
                        size="xs"
                        variant={user.active ? 'default' : 'light'}
                        color={user.active ? undefined : 'steel'}
                        loading={busy(user)}
                        onClick={() =>
                          change(
                            user,
                            { active: !user.active },
                            user.active ? 'User deactivated' : 'User reactivated',
                          )
                        }
                        aria-label={`${user.active ? 'Deactivate' : 'Reactivate'} ${user.displayName}`}
                      >
                        {user.active ? 'Deactivate' : 'Reactivate'}
                      </Button>
                    </Group>
                  )}
                </Table.Td>
              </Table.Tr>
            );
          })}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
