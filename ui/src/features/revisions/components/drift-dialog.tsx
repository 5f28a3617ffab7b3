import { Alert, Loader, Modal, Stack, Table, Text } from '@mantine/core';
import type { DriftReport } from '@holdfast/shared';
import { formatNumber } from '@holdfast/calc';
import { errorMessage } from '../../../lib/api-client';

export interface DriftDialogProps {
  opened: boolean;
  onClose: () => void;
  report: DriftReport | undefined;
  pending: boolean;
  error: unknown;
}

/** What moved when an approved revision is recalculated with today's calc core. */
export function DriftDialog({ opened, onClose, report, pending, error }: DriftDialogProps) {
  return (
    <Modal opened={opened} onClose={onClose} title="Recalculated with today’s core" size="xl">
      {pending ? (
        <Loader size="sm" />
      ) : error ? (
        <Alert color="fail" role="alert">
          {errorMessage(error)}
        </Alert>
      ) : report ? (
        <Stack gap="sm">
          <Text size="sm">
            Approved with core {report.coreVersionThen}; recalculated with core{' '}
            {report.coreVersionNow}.
          </Text>
          {report.error ? (
            <Alert color="fail" role="alert" title="The stored inputs no longer evaluate">
              {report.error}
            </Alert>
          ) : null}
          {report.newestCriteria ? (
            <Alert
              color={
                report.newestCriteria.failing.length || report.newestCriteria.error
                  ? 'fail'
                  : 'pass'
              }
              title={`Against the newest criteria (version ${report.newestCriteria.versionNow}; approved under ${report.newestCriteria.versionThen})`}
              data-newest-criteria
            >
              {report.newestCriteria.error ? (
                <Text size="sm">{report.newestCriteria.error}</Text>
              ) : report.newestCriteria.failing.length === 0 ? (
                <Text size="sm">Every check passes.</Text>
              ) : (
                report.newestCriteria.failing.map((f) => (
                  <Text key={f.id} size="sm">
                    Fails: {f.label}
                  </Text>
                ))
              )}
            </Alert>
          ) : null}
          {report.moved.length === 0 &&
          report.checksChanged.length === 0 &&
          !report.error &&
          !report.newestCriteria?.failing.length &&
          !report.newestCriteria?.error ? (
            <Alert color="pass">No result moved and no check changed. The printout stands.</Alert>
          ) : null}
          {report.checksChanged.length > 0 ? (
            <Alert color="fail" title="Checks that changed">
              {report.checksChanged.map((c) => (
                <Text key={c.id} size="sm">
                  {c.label}: {c.then ? (c.then.pass ? 'pass' : 'fail') : '—'} →{' '}
                  {c.now ? (c.now.pass ? 'pass' : 'fail') : '—'}
                </Text>
              ))}
            </Alert>
          ) : null}
          {report.moved.length > 0 ? (
            <Table fz="sm" aria-label="Results that moved">
              <Table.Thead>
                <Table.Tr>
                  <Table.Th>Result</Table.Th>
                  <Table.Th ta="right">Then</Table.Th>
                  <Table.Th ta="right">Now</Table.Th>
                  <Table.Th>Unit (SI)</Table.Th>
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>
                {report.moved.map((m) => (
                  <Table.Tr key={m.key}>
                    <Table.Td>{m.label}</Table.Td>
                    <Table.Td ta="right" ff="monospace">
                      {formatNumber(m.then, 6)}
                    </Table.Td>
                    <Table.Td ta="right" ff="monospace" fw={600}>
                      {formatNumber(m.now, 6)}
                    </Table.Td>
                    <Table.Td c="dimmed">{m.unit}</Table.Td>
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
          ) : null}
        </Stack>
      ) : null}
    </Modal>
  );
}
