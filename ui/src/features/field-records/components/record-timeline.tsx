import { Badge, Button, Group, Paper, Spoiler, Stack, Text } from '@mantine/core';
import { IconPrinter } from '@tabler/icons-react';
import { fieldRecordKindLabels, type FieldRecord } from '@holdfast/shared';
import { errorMessage } from '../../../lib/api-client';
import { useSignFieldRecord } from '../api/sign-field-record';
import { usePrintFieldRecord } from '../api/print-field-record';
import { isoDay } from '../../../lib/dates';
import { RecordValues } from './record-values';

const statusColour = { draft: 'gray', signed: 'steel', countersigned: 'pass' } as const;

/**
 * The records of a position, newest first, each with its values and its printout; a plant
 * engineer countersigns signed ones here (not one they made or signed: the server refuses it).
 */
export function RecordTimeline(props: {
  records: readonly FieldRecord[];
  canCountersign: boolean;
  /** The signed-in user, to offer no countersignature of their own record. */
  userId: string;
}) {
  const sign = useSignFieldRecord();
  const print = usePrintFieldRecord();
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
          <Spoiler
            maxHeight={0}
            showLabel="Show the values"
            hideLabel="Hide the values"
            mt={4}
            // A record to sign or countersign opens with its values shown: nobody signs unseen
            // numbers.
            defaultExpanded={
              (props.canCountersign && r.status === 'signed') || mayStillSign(r, props.userId)
            }
          >
            <RecordValues measurements={r.measurements} />
          </Spoiler>
          <Group gap="xs" mt="xs">
            {mayStillSign(r, props.userId) && (
              // A record saved and left unsigned (the form closed, the signal lost) is signed here.
              <Button
                size="md"
                loading={sign.isPending && sign.variables?.id === r.id}
                onClick={() => sign.mutate({ id: r.id })}
              >
                Sign the record
              </Button>
            )}
            {props.canCountersign &&
              r.status === 'signed' &&
              r.createdBy.id !== props.userId &&
              r.signed?.by.id !== props.userId && (
                <Button
                  size="md"
                  loading={sign.isPending && sign.variables?.id === r.id}
                  onClick={() => sign.mutate({ id: r.id, counter: true })}
                >
                  Countersign
                </Button>
              )}
            <Button
              variant="default"
              size="md"
              leftSection={<IconPrinter size={18} aria-hidden />}
              loading={print.isPending && print.variables === r.id}
              onClick={() => print.mutate(r.id)}
              aria-label={`Print the record of ${isoDay(r.performedAt)}`}
            >
              Print
            </Button>
          </Group>
          {print.isError && print.variables === r.id && (
            <Text c="fail.8" size="sm">
              Could not print: {errorMessage(print.error)}
            </Text>
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

/** The maker of a saved, unsigned record signs it (the server holds the same rule). */
function mayStillSign(r: FieldRecord, userId: string): boolean {
  return r.status === 'draft' && r.createdBy.id === userId;
}
