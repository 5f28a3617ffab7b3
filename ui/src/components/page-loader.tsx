import { Center, Loader, Stack, Text } from '@mantine/core';

/** A centred spinner for whole-page waits (session restore, lazy route chunks). */
export function PageLoader({
  label = 'Loading…',
  fullScreen = false,
}: {
  label?: string;
  fullScreen?: boolean;
}) {
  return (
    <Center h={fullScreen ? '100vh' : 240} role="status" aria-live="polite">
      <Stack align="center" gap="xs">
        <Loader color="steel" type="bars" size="sm" />
        <Text size="sm" c="dimmed">
          {label}
        </Text>
      </Stack>
    </Center>
  );
}
