import { Anchor, Badge, Paper, Stack, Text } from '@mantine/core';
import { Link } from 'react-router-dom';
import { positionFieldPath, positionPlaceText } from '@holdfast/shared';
import type { DueInspection } from '@holdfast/shared';
import { useDueInspections } from '../api/get-due-inspections';
import { isoDay } from '../../../lib/dates';
import { CountedTitle } from '../../../components/counted-title';

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
  const count = overdue.length + soon.length + awaitingCountersign.length;
  // Laid out as the work queue's other cards: title and count, then one line per item.
  return (
    <Paper p="md" component="section" aria-labelledby="field-due-title">
      <CountedTitle
        id="field-due-title"
        title="Field inspections"
        count={count}
        overdue={overdue.length}
      />
      {count === 0 ? (
        <Text size="sm" c="dimmed">
          Nothing due.
        </Text>
      ) : (
        <Stack gap={6} component="ul" p={0} m={0} style={{ listStyle: 'none' }}>
          {[...overdue, ...soon].map((d) => (
            <li key={d.positionId}>
              <Line d={d} />
            </li>
          ))}
          {awaitingCountersign.map((r) => (
            <li key={r.recordId}>
              <Text size="sm">
                <Anchor component={Link} to={positionFieldPath(r.positionId)} underline="always">
                  {positionPlaceText(r)}
                </Anchor>
                : record of {isoDay(r.performedAt)} awaits your countersignature
                {r.outOfTolerance ? ' (out of tolerance)' : ''}
              </Text>
            </li>
          ))}
        </Stack>
      )}
    </Paper>
  );
}
