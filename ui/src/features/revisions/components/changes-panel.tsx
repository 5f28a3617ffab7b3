import { Paper, Skeleton, Table, Text, Title } from '@mantine/core';
import { IconArrowRight } from '@tabler/icons-react';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { showStoredValue } from '../../../components/calc/utils/stored-value';
import { useRevisionChanges } from '../api/get-revision-changes';
import { isoDayTime } from '../../../lib/dates';

const day = (iso: string) => isoDayTime(iso);

/** "Changed since last submission": the inputs the checker has not seen yet. */
export function ChangesPanel({ revisionId }: { revisionId: string }) {
  const query = useRevisionChanges(revisionId);
  return (
    <Paper p="md" component="section" aria-labelledby="changes-title" data-testid="changes">
      <Title order={2} size="h5" id="changes-title" mb={4}>
        Changed since last submission
      </Title>
      {query.isPending ? (
        <Skeleton h={60} />
      ) : query.isError ? (
        <ErrorPanel error={query.error} onRetry={() => void query.refetch()} />
      ) : !query.data.since ? (
        <Text size="sm" c="dimmed">
          First submission of this sheet: nothing earlier to compare with.
        </Text>
      ) : (
        <>
          <Text size="sm" c="dimmed" mb="xs">
            {query.data.since.kind === 'submission'
              ? `Compared with this revision as it was submitted on ${day(query.data.since.at)}, before it was returned.`
              : `Compared with revision ${query.data.since.label}, submitted on ${day(query.data.since.at)}.`}
          </Text>
          {query.data.changeNote ? (
            <Text size="sm" mb="xs">
              Change note now: “{query.data.changeNote.to || '—'}” (was “
              {query.data.changeNote.from || '—'}”)
            </Text>
          ) : null}
          {query.data.inputs.length === 0 ? (
            <Text size="sm">No input changed.</Text>
          ) : (
            <Table fz="sm" aria-label="Inputs changed since last submission">
              <Table.Thead>
                <Table.Tr>
                  <Table.Th>Input</Table.Th>
                  <Table.Th>Before</Table.Th>
                  <Table.Th w={24} />
                  <Table.Th>Now</Table.Th>
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>
                {query.data.inputs.map((i) => (
                  <Table.Tr key={i.key} data-changed-input={i.key}>
                    <Table.Td>{i.label}</Table.Td>
                    <Table.Td ff="monospace">
                      <Text span inherit td="line-through">
                        {showStoredValue(i.from)}
                      </Text>
                    </Table.Td>
                    <Table.Td>
                      <IconArrowRight size={14} aria-label="changed to" />
                    </Table.Td>
                    <Table.Td ff="monospace" fw={600}>
                      {showStoredValue(i.to)}
                    </Table.Td>
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
          )}
        </>
      )}
    </Paper>
  );
}
