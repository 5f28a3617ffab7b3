import { Button, Stack, Table, Text } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { errorMessage } from '../../../lib/api-error';
import { useFailedMail, useResendMail } from '../api/failed-mail';
import { isoDayTime } from '../../../lib/dates';

/** Mail that used up its retries, newest first, each with a resend. */
export function FailedMailTable() {
  const { data } = useFailedMail();
  const resend = useResendMail();

  if (data.items.length === 0) {
    return (
      <Text c="dimmed" size="sm">
        No undelivered mail. Every notification has left or is still being retried.
      </Text>
    );
  }
  return (
    <Table.ScrollContainer minWidth={720}>
      <Table verticalSpacing="xs" aria-label="Undelivered mail">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Queued</Table.Th>
            <Table.Th>To</Table.Th>
            <Table.Th>Subject</Table.Th>
            <Table.Th>Last error</Table.Th>
            <Table.Th w={110} />
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {data.items.map((mail) => (
            <Table.Tr key={mail.id}>
              <Table.Td>
                <Text size="sm">{isoDayTime(mail.createdAt)}</Text>
              </Table.Td>
              <Table.Td>
                <Text size="sm">{mail.to.join(', ')}</Text>
              </Table.Td>
              <Table.Td>
                <Text size="sm">{mail.subject}</Text>
              </Table.Td>
              <Table.Td>
                <Stack gap={0}>
                  <Text size="xs" c="dimmed">
                    {mail.attempts} attempt{mail.attempts === 1 ? '' : 's'}
                  </Text>
                  <Text size="xs">{mail.lastError ?? '—'}</Text>
                </Stack>
              </Table.Td>
              <Table.Td>
                <Button
                  size="xs"
                  variant="light"
                  loading={resend.isPending && resend.variables === mail.id}
                  aria-label={`Send again: ${mail.subject}`}
                  onClick={() =>
                    resend.mutate(mail.id, {
                      onSuccess: () =>
                        notifications.show({
                          color: 'steel',
                          title: 'Queued again',
                          message: mail.to.join(', '),
                        }),
                      onError: (error) =>
                        notifications.show({
                          color: 'fail',
                          title: 'Not queued',
                          message: errorMessage(error),
                        }),
                    })
                  }
                >
                  Send again
                </Button>
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
