import { Alert, Text } from '@mantine/core';
import { IconCloudOff } from '@tabler/icons-react';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { isApiRequestError } from '../../../lib/api-client';

/**
 * The record form could not be fetched. Without a connection that is said plainly rather than
 * shown as a failure: the form is made from the approved revision on the server, and what was
 * already saved or typed on this device is kept.
 */
export function FormUnavailable({ error }: { error: unknown }) {
  const offline = isApiRequestError(error) && error.status === 0;
  if (!offline) return <ErrorPanel error={error} />;
  return (
    <Alert color="amber" icon={<IconCloudOff aria-hidden />} title="No connection">
      <Text size="sm">
        The record form is made from the approved revision on the server, so it opens once the
        connection returns.
      </Text>
      <Text size="sm" mt={4}>
        Nothing is lost: records saved on this device wait here and are sent when the connection is
        back, and what you typed on this form is kept on this device and shown again when it opens.
      </Text>
    </Alert>
  );
}
