import { Button, Center, Group, Paper, Stack, Text, Title } from '@mantine/core';
import { useRouteError } from 'react-router-dom';
import { Wordmark } from '../../components/brand/wordmark';
import { describeRouteError } from '../../components/errors/route-error-boundary';
import classes from './root-error.module.css';

/** The last line of defence: anything no nested boundary handled, shown outside the frame. */
export function RootErrorBoundary() {
  const error = useRouteError();
  const d = describeRouteError(error) ?? {
    title: 'Something went wrong',
    message: 'An unexpected problem stopped this page. Reload to try again.',
  };
  return (
    <Center className={classes.page}>
      <Paper p="xl" maw={560} w="100%" role="alert">
        <Stack gap="md">
          <div className={classes.brand}>
            <Wordmark />
          </div>
          {d.status ? <Text className={classes.code}>{d.status}</Text> : null}
          <Title order={2}>{d.title}</Title>
          <Text c="dimmed">{d.message}</Text>
          <Group>
            <Button onClick={() => window.location.reload()}>Reload</Button>
            <Button variant="default" component="a" href="/">
              Go to the start page
            </Button>
          </Group>
        </Stack>
      </Paper>
    </Center>
  );
}
