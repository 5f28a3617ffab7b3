import { Divider, Group, Paper, Stack, Text, Title } from '@mantine/core';
import { Page } from '../../../components/layouts/page';
import { RoleBadge } from '../../../components/role-badge';
import { ChangePasswordForm } from '../../../features/auth/components/change-password-form';
import { useCurrentUser } from '../../../lib/session';
import type { RouteHandle } from '../../../lib/route-handle';

export const handle: RouteHandle = { title: 'Your account' };

export function Component() {
  const user = useCurrentUser();
  return (
    <Page title="Your account" description="Who you are signed in as, and your password.">
      <Paper withBorder p="lg" maw={560}>
        <Stack gap="md">
          <Stack gap={2}>
            <Text fw={600}>{user.displayName}</Text>
            <Text size="sm" c="dimmed">
              {user.email}
            </Text>
            <Group gap={6}>
              <RoleBadge role={user.role} size="sm" />
            </Group>
          </Stack>
          <Divider />
          <Title order={2} size="h4">
            Change password
          </Title>
          <ChangePasswordForm />
        </Stack>
      </Paper>
    </Page>
  );
}
