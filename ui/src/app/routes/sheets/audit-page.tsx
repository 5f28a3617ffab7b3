import { useMemo, useState } from 'react';
import { Paper, Skeleton, Switch, Table, Text } from '@mantine/core';
import { useParams } from 'react-router-dom';
import { Page } from '../../../components/layouts/page';
import { ErrorPanel } from '../../../components/errors/error-panel';
import type { RouteHandle } from '../../../lib/route-handle';
import { useSheet } from '../../../features/sheets/api/get-sheet';
import { sheetEyebrow, sheetSubpageLoader } from './sheet-subpage';
import { useSheetAudit } from '../../../features/sheets/api/get-sheet-audit';
import { auditActionWords, auditDetail } from '../../../features/sheets/utils/audit-words';
import { isoDayTime } from '../../../lib/dates';

export const handle: RouteHandle = { wide: true, title: 'Audit trail' };

export const clientLoader = sheetSubpageLoader;

const when = (iso: string) => isoDayTime(iso, true);

/**
 * Who did what to a sheet, and when, from the append-only trail. The server decides what each
 * role may read of it (viewers get states and labels, not draft content).
 */
export function Component() {
  const { sheetId = '' } = useParams();
  const sheet = useSheet(sheetId);
  const audit = useSheetAudit(sheetId);
  const [saves, setSaves] = useState(false);
  const labels = useMemo(
    () => new Map((sheet.data?.revisions ?? []).map((r) => [r.id, r.label])),
    [sheet.data],
  );
  const items = (audit.data?.items ?? []).filter((e) => saves || e.action !== 'revision.saved');
  const hidden = (audit.data?.items.length ?? 0) - items.length;

  return (
    <Page
      eyebrow={sheetEyebrow(sheet.data)}
      title="Audit trail"
      description="Every recorded change to this sheet, oldest first. The trail cannot be edited."
    >
      <Paper p="md">
        <Switch
          mb="sm"
          label={`Show draft saves${hidden > 0 ? ` (${hidden} hidden)` : ''}`}
          checked={saves}
          onChange={(e) => setSaves(e.currentTarget.checked)}
        />
        {audit.isPending ? (
          <Skeleton h={240} />
        ) : audit.isError ? (
          <ErrorPanel error={audit.error} onRetry={() => void audit.refetch()} />
        ) : items.length === 0 ? (
          <Text size="sm">Nothing recorded yet.</Text>
        ) : (
          <Table.ScrollContainer minWidth={640}>
            <Table fz="sm" striped aria-label="Audit trail">
              <Table.Thead>
                <Table.Tr>
                  <Table.Th w={170}>When</Table.Th>
                  <Table.Th w={130}>Who</Table.Th>
                  <Table.Th w={200}>What</Table.Th>
                  <Table.Th>Detail</Table.Th>
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>
                {items.map((e) => (
                  <Table.Tr key={e.id} data-audit={e.action}>
                    <Table.Td style={{ whiteSpace: 'nowrap' }}>{when(e.at)}</Table.Td>
                    <Table.Td>{e.actor?.displayName ?? 'the system'}</Table.Td>
                    <Table.Td>{auditActionWords(e.action)}</Table.Td>
                    <Table.Td style={{ whiteSpace: 'pre-wrap' }}>
                      {auditDetail(e, (id) => labels.get(id))}
                    </Table.Td>
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
          </Table.ScrollContainer>
        )}
      </Paper>
    </Page>
  );
}
