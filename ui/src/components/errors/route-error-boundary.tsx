import { Button, Stack, Text, Title } from '@mantine/core';
import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { ApiRequestError } from '../../lib/api-error';
import { paths } from '../../config/paths';
import classes from './error-page.module.css';

export interface ErrorDescription {
  status?: number;
  title: string;
  message: string;
}

/** Turn whatever a route threw into a title and a sentence. Returns null for unknown values. */
export function describeRouteError(error: unknown): ErrorDescription | null {
  if (isRouteErrorResponse(error)) {
    if (error.status === 404)
      return { status: 404, title: 'Not found', message: 'There is nothing at this address.' };
    const data = typeof error.data === 'string' ? error.data : error.statusText;
    if (error.status === 403)
      return {
        status: 403,
        title: 'Not allowed',
        message: data || 'Your role does not allow this.',
      };
    return {
      status: error.status,
      title: `Error ${error.status}`,
      message: data || 'The request failed.',
    };
  }
  if (error instanceof ApiRequestError) {
    if (error.status === 404) return { status: 404, title: 'Not found', message: error.message };
    if (error.status === 403) return { status: 403, title: 'Not allowed', message: error.message };
    return {
      status: error.status || undefined,
      title: 'The server refused this',
      message: error.message,
    };
  }
  if (error instanceof Error)
    return { title: 'Something broke on this page', message: error.message };
  return null;
}

export function ErrorView({ status, title, message }: ErrorDescription) {
  return (
    <Stack align="flex-start" gap="sm" className={classes.box} role="alert">
      {status ? (
        <Text className={classes.code} aria-hidden>
          {status}
        </Text>
      ) : null}
      <Title order={2}>{title}</Title>
      <Text c="dimmed">{message}</Text>
      <Button component={Link} to={paths.home.build()} variant="light" mt="sm">
        Back to the work queue
      </Button>
    </Stack>
  );
}

/**
 * A nested boundary for pages inside the frame: it keeps the navigation on screen. Values it
 * does not recognise go up to the root boundary.
 */
export function RouteErrorBoundary() {
  const error = useRouteError();
  const description = describeRouteError(error);
  if (!description) throw error;
  return <ErrorView {...description} />;
}
