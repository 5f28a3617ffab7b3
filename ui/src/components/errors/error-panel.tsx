import type { ReactNode } from 'react';
import { Alert, Button, Group, Stack, Text } from '@mantine/core';
import { IconAlertOctagon } from '@tabler/icons-react';
import { errorMessage } from '../../lib/api-error';

export interface ErrorPanelProps {
  title?: string;
  error?: unknown;
  children?: ReactNode;
  onRetry?: () => void;
}

/** An error in place of content: what went wrong, in plain words, and a way to retry. */
export function ErrorPanel({
  title = 'This could not be loaded',
  error,
  children,
  onRetry,
}: ErrorPanelProps) {
  return (
    <Alert
      color="fail"
      variant="light"
      title={title}
      icon={<IconAlertOctagon aria-hidden />}
      role="alert"
    >
      <Stack gap="xs">
        {error !== undefined ? <Text size="sm">{errorMessage(error)}</Text> : null}
        {children}
        {onRetry ? (
          <Group>
            <Button size="xs" variant="default" onClick={onRetry}>
              Try again
            </Button>
          </Group>
        ) : null}
      </Stack>
    </Alert>
  );
}
