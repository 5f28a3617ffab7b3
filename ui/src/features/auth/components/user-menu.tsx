import {
  Avatar,
  Group,
  Menu,
  SegmentedControl,
  Stack,
  Text,
  UnstyledButton,
  VisuallyHidden,
} from '@mantine/core';
import { notifications } from '@mantine/notifications';
import {
  IconChevronDown,
  IconDecimal,
  IconKey,
  IconLogout,
  IconRulerMeasure,
} from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import type { User } from '@holdfast/shared';
import { RoleBadge } from '../../../components/role-badge';
import { errorMessage } from '../../../lib/api-error';
import { useCurrentUser } from '../../../lib/session';
import { useSignOut } from '../api/sign-out';
import { useUpdateMe } from '../api/update-me';
import classes from './user-menu.module.css';

const unitLabels: Record<User['unitSystem'], string> = {
  SI: 'SI (N, mm, N·m)',
  US: 'US customary (lbf, in, lbf·ft)',
};

export function UserMenu() {
  const user = useCurrentUser();
  const signOut = useSignOut();
  const updateMe = useUpdateMe();

  const change = (input: Parameters<typeof updateMe.mutate>[0], what: string) =>
    updateMe.mutate(input, {
      onError: (error) =>
        notifications.show({
          color: 'fail',
          title: `${what} not saved`,
          message: errorMessage(error),
        }),
    });
  const changeUnits = (unitSystem: string) =>
    change({ unitSystem: unitSystem as User['unitSystem'] }, 'Unit system');
  const changeFormat = (numberFormat: string) =>
    change({ numberFormat: numberFormat as User['numberFormat'] }, 'Number format');

  return (
    <Menu position="bottom-end" width={280} shadow="md" closeOnItemClick>
      <Menu.Target>
        {/* Named by its content, so the name holds the visible text (WCAG 2.5.3). */}
        <UnstyledButton className={classes.trigger}>
          <VisuallyHidden>User menu for </VisuallyHidden>
          <Group gap={8} wrap="nowrap">
            <Avatar color="amber" variant="filled" radius="sm" size={30} aria-hidden>
              {user.initials}
            </Avatar>
            <Text size="sm" fw={500} className={classes.name} data-testid="current-user-name">
              {user.displayName}
            </Text>
            <IconChevronDown size={14} aria-hidden />
          </Group>
        </UnstyledButton>
      </Menu.Target>
      <Menu.Dropdown>
        <Stack gap={4} px="sm" py="xs">
          <Text fw={600} size="sm">
            {user.displayName}
          </Text>
          <Text size="xs" c="dimmed">
            {user.email}
          </Text>
          <Group gap={6}>
            <RoleBadge role={user.role} size="sm" />
          </Group>
        </Stack>
        <Menu.Divider />
        <Menu.Label>
          <Group gap={6}>
            <IconRulerMeasure size={14} aria-hidden /> Default units
          </Group>
        </Menu.Label>
        <Stack px="sm" pb="xs" gap={4}>
          <SegmentedControl
            fullWidth
            size="xs"
            value={user.unitSystem}
            onChange={changeUnits}
            disabled={updateMe.isPending}
            aria-label="Default unit system"
            data={[
              { value: 'SI', label: 'SI' },
              { value: 'US', label: 'US' },
            ]}
          />
          <Text size="xs" c="dimmed">
            {unitLabels[user.unitSystem]}
          </Text>
        </Stack>
        <Menu.Label>
          <Group gap={6}>
            <IconDecimal size={14} aria-hidden /> Number format
          </Group>
        </Menu.Label>
        <Stack px="sm" pb="xs" gap={4}>
          <SegmentedControl
            fullWidth
            size="xs"
            value={user.numberFormat}
            onChange={changeFormat}
            disabled={updateMe.isPending}
            aria-label="Number format"
            data={[
              { value: 'point', label: '2.5 (point)' },
              { value: 'comma', label: '2,5 (comma)' },
            ]}
          />
          <Text size="xs" c="dimmed">
            How you type decimals in sheet fields.
          </Text>
        </Stack>
        <Menu.Divider />
        <Menu.Item component={Link} to="/account" leftSection={<IconKey size={16} aria-hidden />}>
          Account and password
        </Menu.Item>
        <Menu.Item
          leftSection={<IconLogout size={16} aria-hidden />}
          onClick={() => signOut.mutate()}
          disabled={signOut.isPending}
        >
          Sign out
        </Menu.Item>
      </Menu.Dropdown>
    </Menu>
  );
}
