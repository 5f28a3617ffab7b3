import { Anchor, Group, Table, Text, UnstyledButton } from '@mantine/core';
import { IconArrowDown, IconArrowUp, IconArrowsSort } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import type { SheetSummary } from '@holdfast/shared';
import { sheetTypeTitle } from '../../calc/utils/sheet-types';
import { StateBadge } from './state-badge';

export type SortKey = 'documentNumber' | 'title' | 'updatedAt' | 'state';

export interface SheetsTableProps {
  items: SheetSummary[];
  sort: SortKey;
  order: 'asc' | 'desc';
  onSort: (key: SortKey) => void;
}

function SortHeader({
  label,
  k,
  sort,
  order,
  onSort,
}: { label: string; k: SortKey } & Omit<SheetsTableProps, 'items'>) {
  const active = sort === k;
  const Icon = !active ? IconArrowsSort : order === 'asc' ? IconArrowUp : IconArrowDown;
  return (
    <Table.Th aria-sort={active ? (order === 'asc' ? 'ascending' : 'descending') : 'none'}>
      <UnstyledButton onClick={() => onSort(k)} fw={600} fz="sm">
        <Group gap={4} wrap="nowrap">
          {label}
          <Icon size={14} aria-hidden opacity={active ? 1 : 0.4} />
        </Group>
      </UnstyledButton>
    </Table.Th>
  );
}

/** One page of sheets; sorting is done by the server, the headers only ask for it. */
export function SheetsTable({ items, sort, order, onSort }: SheetsTableProps) {
  const head = { sort, order, onSort };
  return (
    <Table.ScrollContainer minWidth={860}>
      <Table highlightOnHover verticalSpacing="xs" fz="sm" aria-label="Calculation sheets">
        <Table.Thead>
          <Table.Tr>
            <SortHeader label="Number" k="documentNumber" {...head} />
            <SortHeader label="Title" k="title" {...head} />
            <Table.Th>Brake position</Table.Th>
            <Table.Th>Type</Table.Th>
            <SortHeader label="Latest" k="state" {...head} />
            <Table.Th>In force</Table.Th>
            <Table.Th>Owner</Table.Th>
            <SortHeader label="Changed" k="updatedAt" {...head} />
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {items.map((s) => (
            <Table.Tr key={s.id} data-sheet={s.documentNumber}>
              <Table.Td ff="monospace" style={{ whiteSpace: 'nowrap' }}>
                <Anchor component={Link} to={`/sheets/${s.id}`} size="sm" ff="monospace">
                  {s.documentNumber}
                </Anchor>
              </Table.Td>
              <Table.Td>{s.title}</Table.Td>
              <Table.Td>
                <Text size="sm">{s.position.tag}</Text>
                <Text size="xs" c="dimmed">
                  {s.site.code} · {s.machine.tag}
                </Text>
              </Table.Td>
              <Table.Td>{sheetTypeTitle(s.sheetType)}</Table.Td>
              <Table.Td miw={150}>
                <Group gap={6} wrap="nowrap">
                  <Text size="sm" fw={600}>
                    {s.latest.label}
                  </Text>
                  <StateBadge state={s.latest.state} size="xs" />
                </Group>
              </Table.Td>
              <Table.Td>
                {s.approved ? (
                  `Rev. ${s.approved.label}`
                ) : (
                  <Text span c="dimmed" size="sm">
                    none
                  </Text>
                )}
              </Table.Td>
              <Table.Td>{s.owner.initials}</Table.Td>
              <Table.Td c="dimmed">{new Date(s.updatedAt).toLocaleDateString('en-GB')}</Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
