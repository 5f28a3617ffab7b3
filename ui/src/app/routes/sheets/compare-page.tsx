import { Group, Paper, Select, Skeleton, Stack, Text } from '@mantine/core';
import { useParams, useSearchParams } from 'react-router-dom';
import { Page } from '../../../components/layouts/page';
import { ErrorPanel } from '../../../components/errors/error-panel';
import type { RouteHandle } from '../../../lib/route-handle';
import { useCurrentUser } from '../../../lib/session';
import { useComparison } from '../../../features/compare/api/get-comparison';
import { CompareView } from '../../../features/compare/components/compare-view';
import { useSheet } from '../../../features/sheets/api/get-sheet';
import { sheetEyebrow, sheetSubpageLoader } from './sheet-subpage';
import { visibleRevisions } from './sheet-page';
import { findSheetType } from '../../../components/calc/utils/sheet-types';

export const handle: RouteHandle = { caution: true, wide: true, title: 'Compare revisions' };

export const clientLoader = sheetSubpageLoader;

export function Component() {
  const { sheetId = '' } = useParams();
  const [search, setSearch] = useSearchParams();
  const user = useCurrentUser();
  const sheet = useSheet(sheetId);
  const revisions = sheet.data ? visibleRevisions(sheet.data, user) : [];
  // Opened without a choice (from the address bar or a bookmark): the latest two revisions.
  const from = search.get('from') ?? revisions.at(-2)?.id ?? '';
  const to = search.get('to') ?? revisions.at(-1)?.id ?? '';
  const cmp = useComparison(sheetId, from, to);
  const options = revisions.map((r) => ({ value: r.id, label: `Revision ${r.label}` }));
  const pick = (key: 'from' | 'to', v: string | null) =>
    setSearch((prev) => {
      const next = new URLSearchParams(prev);
      // Keep the other side as shown, default or chosen.
      if (from && !next.has('from')) next.set('from', from);
      if (to && !next.has('to')) next.set('to', to);
      if (v) next.set(key, v);
      return next;
    });

  return (
    <Page
      eyebrow={sheetEyebrow(sheet.data)}
      title="Compare revisions"
      description="Inputs that changed and how each result and check moved."
    >
      <Paper p="sm">
        <Group gap="md" align="flex-end">
          <Select
            label="From"
            data={options}
            value={from || null}
            onChange={(v) => pick('from', v)}
            w={180}
            allowDeselect={false}
          />
          <Select
            label="To"
            data={options}
            value={to || null}
            onChange={(v) => pick('to', v)}
            w={180}
            allowDeselect={false}
          />
        </Group>
      </Paper>
      {!from || !to || from === to ? (
        <Text c="dimmed">Pick two different revisions.</Text>
      ) : cmp.isPending ? (
        <Stack>
          <Skeleton h={120} />
          <Skeleton h={200} />
        </Stack>
      ) : cmp.isError ? (
        <ErrorPanel error={cmp.error} onRetry={() => void cmp.refetch()} />
      ) : (
        <CompareView data={cmp.data} fields={findSheetType(sheet.data?.sheetType ?? '')?.fields} />
      )}
    </Page>
  );
}
