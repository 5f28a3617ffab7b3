import { Badge, Button, Group, Paper, Stack, Text } from '@mantine/core';
import { fieldRecordKindLabels, type FieldRecord } from '@holdfast/shared';
import { errorMessage } from '../../../lib/api-client';
import { useSignFieldRecord } from '../api/sign-field-record';
import { isoDay } from '../../../lib/dates';

const statusColour = { draft: 'gray', signed: 'steel', countersigned: 'pass' } as const;

/** The records of a position, newest first; plant engineers countersign signed ones here. */
export function RecordTimeline(props: {
  records: readonly FieldRecord[];
  canCountersign: boolean;
}) {
  const sign = useSignFieldRecord();
  const newest = [...props.records].sort((a, b) => b.performedAt.localeCompare(a.performedAt));
  if (newest.length === 0) return <Text c="dimmed">No field records yet.</Text>;
  return (
    <Stack gap="sm" component="ol" p={0} m={0} style={{ listStyle: 'none' }}>
      {newest.map((r) => (
        <Paper withBorder p="sm" radius="md" component="li" key={r.id} data-record={r.id}>
          <Group justify="space-between" wrap="wrap" gap="xs">
            <Text fw={600}>
              {isoDay(r.performedAt)} · {fieldRecordKindLabels[r.kind]}
            </Text>
            <Group gap={4}>
              <Badge color={statusColour[r.status]}>{r.status}</Badge>
              {r.outOfTolerance && <Badge color="fail">out of tolerance</Badge>}
              {r.flags.superseded && <Badge color="amber">revision superseded</Badge>}
              {r.flags.underReview && <Badge color="amber">revision under review</Badge>}
            </Group>
          </Group>
          <Text size="sm">
            Set to {r.documentNumber} rev. {r.revisionLabel}
            {r.signed ? ` · signed by ${r.signed.by.displayName}` : ''}
            {r.countersigned ? ` · countersigned by ${r.countersigned.by.displayName}` : ''}
          </Text>
          {r.findings && <Text size="sm">Findings: {r.findings}</Text>}
          {props.canCountersign && r.status === 'signed' && (
            <Button
              mt="xs"
              size="md"
              loading={sign.isPending && sign.variables?.id === r.id}
              onClick={() => sign.mutate({ id: r.id, counter: true })}
            >
              Countersign
            </Button>
          )}
          {sign.isError && sign.variables?.id === r.id && (
            <Text c="fail.8" size="sm">
              {errorMessage(sign.error)}
            </Text>
          )}
        </Paper>
      ))}
    </Stack>
  );
}
