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
import { IconChevronDown, IconLogout, IconRulerMeasure } from '@tabler/icons-react';
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

  const changeUnits = (unitSystem: string) =>
    updateMe.mutate(
      { unitSystem: unitSystem as User['unitSystem'] },
      {
        onError: (error) =>
          notifications.show({
            color: 'fail',
            title: 'Unit system not saved',
            message: errorMessage(error),
          }),
      },
    );

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
        <Menu.Divider />
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
