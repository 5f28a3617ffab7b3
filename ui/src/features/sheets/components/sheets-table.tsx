import { Anchor, Checkbox, Group, Table, Text, UnstyledButton } from '@mantine/core';
import { IconArrowDown, IconArrowUp, IconArrowsSort } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import type { SheetSummary } from '@holdfast/shared';
import { sheetTypeTitle } from '../../../components/calc/utils/sheet-types';
import { StateBadge } from './state-badge';
import { isoDay } from '../../../lib/dates';

export type SortKey = 'documentNumber' | 'title' | 'updatedAt' | 'state';

export interface SheetsTableProps {
  items: SheetSummary[];
  sort: SortKey;
  order: 'asc' | 'desc';
  onSort: (key: SortKey) => void;
  /** Approved revision ids chosen for a safety-file printout. */
  selected?: ReadonlySet<string>;
  onToggle?: (approvedRevisionId: string) => void;
}

function SortHeader({
  label,
  k,
  sort,
  order,
  onSort,
}: { label: string; k: SortKey } & Pick<SheetsTableProps, 'sort' | 'order' | 'onSort'>) {
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
export function SheetsTable({ items, sort, order, onSort, selected, onToggle }: SheetsTableProps) {
  const head = { sort, order, onSort };
  return (
    // Below 860 px the table scrolls inside its card; the scrollbar stays in sight (Mantine's
    // default shows it only on hover), so the columns past the edge are seen to be there.
    <Table.ScrollContainer minWidth={860} scrollAreaProps={{ type: 'auto' }}>
      <Table highlightOnHover verticalSpacing="xs" fz="sm" aria-label="Calculation sheets">
        <Table.Thead>
          <Table.Tr>
            {onToggle ? (
              <Table.Th w={36}>
                <Text span size="xs" fw={600} title="Print the approved revision">
                  Print
                </Text>
              </Table.Th>
            ) : null}
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
              {onToggle ? (
                <Table.Td>
                  {s.approved ? (
                    <Checkbox
                      size="xs"
                      aria-label={`Print ${s.documentNumber} rev. ${s.approved.label}`}
                      checked={selected?.has(s.approved.id) ?? false}
                      onChange={() => onToggle(s.approved!.id)}
                    />
                  ) : null}
                </Table.Td>
              ) : null}
              <Table.Td ff="monospace" style={{ whiteSpace: 'nowrap' }}>
                <Anchor component={Link} to={`/sheets/${s.id}`} size="sm" ff="monospace">
                  {s.documentNumber}
                </Anchor>
              </Table.Td>
              <Table.Td>{s.title}</Table.Td>
              {/* Codes such as LC-1 are read whole: never broken at their hyphen. */}
              <Table.Td style={{ whiteSpace: 'nowrap' }}>
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
              <Table.Td style={{ whiteSpace: 'nowrap' }}>
                {s.approved ? (
                  `Rev. ${s.approved.label}`
                ) : (
                  <Text span c="dimmed" size="sm">
                    none
                  </Text>
                )}
              </Table.Td>
              <Table.Td>{s.owner.initials}</Table.Td>
              <Table.Td c="dimmed" style={{ whiteSpace: 'nowrap' }}>
                {isoDay(s.updatedAt)}
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
