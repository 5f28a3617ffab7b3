import { Anchor, Badge, Paper, Stack, Text, Title } from '@mantine/core';
import { Link } from 'react-router-dom';
import { positionFieldPath, positionPlaceText } from '@holdfast/shared';
import type { DueInspection } from '@holdfast/shared';
import { useDueInspections } from '../api/get-due-inspections';
import { isoDay } from '../../../lib/dates';

function dueText(d: DueInspection): string {
  if (d.nextDue.date) return `due ${isoDay(d.nextDue.date)}`;
  if (d.nextDue.meterHours !== null) return `due at ${Math.floor(d.nextDue.meterHours)} h`;
  return 'no interval set';
}

function Line({ d }: { d: DueInspection }) {
  // A div, not a paragraph: the overdue badge is a block element.
  return (
    <Text size="sm" component="div">
      <Anchor component={Link} to={positionFieldPath(d.positionId)} underline="always">
        {positionPlaceText(d)}
      </Anchor>{' '}
      {dueText(d)}
      {d.nextDue.overdue ? (
        <Badge ml="xs" color="fail" size="sm">
          overdue
        </Badge>
      ) : null}
    </Text>
  );
}

/** Brake inspections overdue and coming due, and field records awaiting a countersignature. */
export function DueInspectionsPanel() {
  const due = useDueInspections();
  if (!due.data) return null;
  const { overdue, due: soon, awaitingCountersign } = due.data;
  return (
    <Paper withBorder p="md" component="section" aria-labelledby="field-due-title">
      <Title order={2} size="h5" id="field-due-title" mb="sm">
        Field inspections
      </Title>
      <Stack gap={4}>
        {overdue.length + soon.length + awaitingCountersign.length === 0 && (
          <Text size="sm" c="dimmed">
            Nothing due.
          </Text>
        )}
        {overdue.map((d) => (
          <Line key={d.positionId} d={d} />
        ))}
        {soon.map((d) => (
          <Line key={d.positionId} d={d} />
        ))}
        {awaitingCountersign.map((r) => (
          <Text size="sm" key={r.recordId}>
            <Anchor component={Link} to={positionFieldPath(r.positionId)} underline="always">
              {positionPlaceText(r)}
            </Anchor>
            : record of {isoDay(r.performedAt)} awaits your countersignature
            {r.outOfTolerance ? ' (out of tolerance)' : ''}
          </Text>
        ))}
      </Stack>
    </Paper>
  );
}
