import { Paper, Stack, Text, ThemeIcon } from '@mantine/core';
import { IconTools } from '@tabler/icons-react';

/** Stand-in content for a screen that is not built yet. */
export function PlaceholderPanel({ children }: { children?: React.ReactNode }) {
  return (
    <Paper p="xl">
      <Stack align="center" gap="xs" py="lg">
        <ThemeIcon size={44} radius="xl" variant="light" color="steel">
          <IconTools size={24} aria-hidden />
        </ThemeIcon>
        <Text fw={600}>This screen is being built</Text>
        <Text size="sm" c="dimmed" ta="center" maw={440}>
          {children ?? 'It arrives with the workbench.'}
        </Text>
      </Stack>
    </Paper>
  );
}
