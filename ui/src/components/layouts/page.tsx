import type { ReactNode } from 'react';
import { Box, Group, Stack, Text, Title } from '@mantine/core';
import { SafetyCaution } from '../safety-caution';
import classes from './page.module.css';

export interface PageProps {
  title: ReactNode;
  /** One line under the title. */
  description?: ReactNode;
  /** Buttons on the right of the title. */
  actions?: ReactNode;
  /** Small text above the title, e.g. a breadcrumb. */
  eyebrow?: ReactNode;
  /**
   * Show the safety caution at the bottom of the page. Calculation pages normally get it from the
   * frame footer through the route handle (`handle: { caution: true }`) instead.
   */
  caution?: boolean;
  children: ReactNode;
}

/** The standard page body inside the app frame: header row, then content. */
export function Page({ title, description, actions, eyebrow, caution, children }: PageProps) {
  return (
    <Stack gap="lg" className={classes.page}>
      <Group justify="space-between" align="flex-end" wrap="wrap" gap="sm">
        <Box>
          {eyebrow ? (
            <Text size="xs" c="dimmed" fw={500} className={classes.eyebrow}>
              {eyebrow}
            </Text>
          ) : null}
          <Title order={1} className={classes.title}>
            {title}
          </Title>
          {description ? (
            <Text size="sm" c="dimmed" mt={4}>
              {description}
            </Text>
          ) : null}
        </Box>
        {actions ? <Group gap="xs">{actions}</Group> : null}
      </Group>
      {children}
      {caution ? <SafetyCaution variant="block" /> : null}
    </Stack>
  );
}
