import { Anchor, Button, Group, Stack, Table, Text } from '@mantine/core';
import { Link } from 'react-router-dom';
import { positionFieldPath } from '@holdfast/shared';
import type { Position } from '@holdfast/shared';
import { sheetTypeTitle } from '../../../components/calc/utils/sheet-types';
import { stateLabel } from '../../../lib/state-label';
import { newFieldRecordPath } from '../../../lib/field-work';

export interface PositionRowProps {
  position: Position;
  /** Shown to those who may edit the register. */
  onEdit?: () => void;
  /** Offer "Record field work" (to those the server lets record it). */
  canRecord?: boolean;
  /** Offer "Start a sheet" on a position with no sheet yet (to those who may author sheets). */
  canStart?: boolean;
}

/** One brake position: what it is in the plant's words, its sheet in force per sheet type. */
export function PositionRow({
  position: p,
  onEdit,
  canRecord = false,
  canStart = false,
}: PositionRowProps) {
  const described = [p.brakeKind, p.thruster, p.lining].filter((x) => x.trim());
  return (
    <Table.Tr data-position={p.tag}>
      <Table.Td ff="monospace">{p.tag}</Table.Td>
      <Table.Td>
        <Text size="sm">{p.description}</Text>
        {described.length > 0 ? (
          <Text size="xs" c="dimmed" data-testid="position-words">
            {described.join(' · ')}
          </Text>
        ) : null}
      </Table.Td>
      <Table.Td>{p.motion.replace('-', ' ')}</Table.Td>
      <Table.Td>
        {p.inForce.length === 0 ? (
          <Group gap="xs">
            <Text span size="sm" c="fail.8">
              None approved
            </Text>
            {canStart && p.openSheets.length === 0 ? (
              <Anchor
                component={Link}
                to={`/sheets?new=${encodeURIComponent(p.id)}`}
                size="sm"
                aria-label={`Start a sheet for ${p.tag}`}
              >
                Start a sheet
              </Anchor>
            ) : null}
          </Group>
        ) : (
          <Stack gap={2}>
            {p.inForce.map((f) => (
              <Anchor
                key={f.sheetId}
                component={Link}
                to={`/sheets/${f.sheetId}/revisions/${f.revisionId}`}
                size="sm"
                data-in-force={f.sheetType}
              >
                <Text span ff="monospace" size="sm">
                  {f.documentNumber}
                </Text>{' '}
                rev. {f.revisionLabel}{' '}
                <Text span size="xs" c="dimmed">
                  ({sheetTypeTitle(f.sheetType)})
                </Text>
              </Anchor>
            ))}
          </Stack>
        )}
        {p.inForce.length > 0 ? (
          <Group gap="xs" mt={4}>
            <Anchor component={Link} to={positionFieldPath(p.id)} size="sm">
              Field records
            </Anchor>
            {(canRecord ? p.inForce : []).map((f) => (
              <Anchor
                key={f.revisionId}
                component={Link}
                to={newFieldRecordPath(f.revisionId)}
                size="sm"
                aria-label={`Record field work on ${p.tag} against ${f.documentNumber} rev. ${f.revisionLabel}`}
              >
                Record field work
                {p.inForce.length > 1 ? ` (${f.documentNumber})` : ''}
              </Anchor>
            ))}
          </Group>
        ) : null}
        {p.openSheets.map((o) => (
          <Text key={o.sheetId} size="xs" c="dimmed">
            Open: {o.documentNumber} rev. {o.revisionLabel} ({stateLabel(o.state).toLowerCase()})
          </Text>
        ))}
      </Table.Td>
      {onEdit ? (
        <Table.Td>
          <Button size="compact-xs" variant="subtle" onClick={onEdit} aria-label={`Edit ${p.tag}`}>
            Edit
          </Button>
        </Table.Td>
      ) : null}
    </Table.Tr>
  );
}
