import { useEffect, useMemo, useState } from 'react';
import {
  Button,
  Group,
  Pagination,
  Paper,
  Select,
  Skeleton,
  Stack,
  Text,
  TextInput,
} from '@mantine/core';
import { useDebouncedValue } from '@mantine/hooks';
import { IconFileSpreadsheet, IconPlus, IconPrinter, IconSearch } from '@tabler/icons-react';
import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import {
  revisionStates,
  sheetTypeIds,
  type RevisionState,
  type SheetTypeId,
} from '@holdfast/shared';
import { Page } from '../../../components/layouts/page';
import { ErrorPanel } from '../../../components/errors/error-panel';
import type { RouteHandle } from '../../../lib/route-handle';
import { hasRole, useCurrentUser } from '../../../lib/session';
import { sheetTypeTitle } from '../../../components/calc/utils/sheet-types';
import { useRegister } from '../../../features/register/api/get-register';
import { sheetsQueryOptions, useSheets } from '../../../features/sheets/api/get-sheets';
import type { SheetListParams } from '../../../lib/query-keys';
import { CreateSheetDialog } from '../../../features/sheets/components/create-sheet-dialog';
import { SheetsTable, type SortKey } from '../../../features/sheets/components/sheets-table';
import { stateLabel } from '../../../lib/state-label';
import { fitWidth } from '../../../lib/fit-width';
import { positionGroups } from './position-groups';
import { suggestedSheetType } from '../../../features/sheets/utils/suggested-sheet-type';
import { useListOutputs } from './use-list-outputs';
import { OwnerFilter } from './owner-filter';

export const handle: RouteHandle = { title: 'Sheets', wide: true };

const PAGE_SIZE = 25;

export function paramsFrom(search: URLSearchParams): SheetListParams {
  const get = (k: string) => search.get(k) || undefined;
  return {
    q: get('q'),
    state: get('state') as RevisionState | undefined,
    siteId: get('siteId'),
    machineId: get('machineId'),
    sheetType: get('sheetType') as SheetTypeId | undefined,
    ownerId: get('ownerId'),
    page: Number(get('page') ?? 1),
    pageSize: PAGE_SIZE,
    sort: (get('sort') as SortKey | undefined) ?? 'documentNumber',
    order: (get('order') as 'asc' | 'desc' | undefined) ?? 'asc',
  };
}

export function clientLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    await queryClient.ensureQueryData(
      sheetsQueryOptions(paramsFrom(new URL(request.url).searchParams)),
    );
    return null;
  };
}

const stateOptions = revisionStates.map((s) => ({ value: s, label: stateLabel(s) }));
const typeOptions = sheetTypeIds.map((id) => ({ value: id, label: sheetTypeTitle(id) }));

export function Component() {
  const user = useCurrentUser();
  const navigate = useNavigate();
  const [search, setSearch] = useSearchParams();
  const params = paramsFrom(search);
  const sheets = useSheets(params);
  const register = useRegister();
  const [text, setText] = useState(params.q ?? '');
  const [debounced] = useDebouncedValue(text, 300);
  // `?new=<position id>` (from "Start a sheet" on the equipment page) opens the dialog on it.
  const startOn = search.get('new');
  const [createOpen, setCreateOpen] = useState(false);
  const { picked, toggle, printPicked, exportCsv, printing } = useListOutputs(params);

  const set = (patch: Record<string, string | undefined>) =>
    setSearch((prev) => {
      const next = new URLSearchParams(prev);
      for (const [k, v] of Object.entries(patch)) {
        if (v) next.set(k, v);
        else next.delete(k);
      }
      if (!('page' in patch)) next.delete('page');
      return next;
    });

  useEffect(() => {
    if ((debounced || undefined) !== params.q) set({ q: debounced || undefined });
    // Only the debounced text drives the URL.
  }, [debounced]); // eslint-disable-line react-hooks/exhaustive-deps

  const sites = useMemo(() => register.data?.sites ?? [], [register.data]);
  const machines = useMemo(() => {
    // Two sites may each have a CR-9: with no site chosen, each machine says which site it is on.
    const qualify = !params.siteId && sites.length > 1;
    return sites
      .filter((s) => !params.siteId || s.id === params.siteId)
      .flatMap((s) =>
        s.machines.map((m) => ({
          value: m.id,
          label: `${qualify ? `${s.code} · ` : ''}${m.tag} — ${m.name}`,
        })),
      );
  }, [sites, params.siteId]);
  const siteOptions = useMemo(
    () => sites.map((s) => ({ value: s.id, label: `${s.code} — ${s.name}` })),
    [sites],
  );
  // Sheets are started and owned by engineers and checkers only (the server's rule).
  const canCreate = hasRole(user, 'engineer', 'checker');
  const positionsById = useMemo(
    () =>
      new Map(sites.flatMap((s) => s.machines.flatMap((m) => m.positions.map((p) => [p.id, p])))),
    [sites],
  );
  const closeCreate = () => {
    setCreateOpen(false);
    if (startOn) set({ new: undefined });
  };
  const onSort = (key: SortKey) =>
    set({ sort: key, order: params.sort === key && params.order === 'asc' ? 'desc' : 'asc' });

  return (
    <Page
      title="Sheets"
      description={
        canCreate
          ? 'Every calculation sheet, by document number. Filter, sort, or start a new one.'
          : 'Every calculation sheet, by document number. Filter and sort to find one.'
      }
      actions={
        <Group gap="xs">
          <Button
            variant="default"
            leftSection={<IconPrinter size={16} aria-hidden />}
            disabled={picked.size === 0}
            loading={printing}
            onClick={printPicked}
          >
            Print selected ({picked.size})
          </Button>
          <Button
            variant="default"
            leftSection={<IconFileSpreadsheet size={16} aria-hidden />}
            onClick={exportCsv}
          >
            Export CSV
          </Button>
          {canCreate ? (
            <Button
              leftSection={<IconPlus size={16} aria-hidden />}
              onClick={() => setCreateOpen(true)}
            >
              New sheet
            </Button>
          ) : null}
        </Group>
      }
    >
      <Paper p="sm">
        <Group gap="sm" align="flex-end" wrap="wrap">
          <TextInput
            label="Search"
            placeholder="Number, title or tag"
            leftSection={<IconSearch size={14} aria-hidden />}
            value={text}
            onChange={(e) => setText(e.currentTarget.value)}
            w={220}
          />
          <Select
            label="State"
            placeholder="Any"
            clearable
            w={fitWidth(
              stateOptions.map((o) => o.label),
              140,
            )}
            data={stateOptions}
            value={params.state ?? null}
            onChange={(v) => set({ state: v ?? undefined })}
          />
          <Select
            label="Site"
            placeholder="Any"
            clearable
            w={fitWidth(
              siteOptions.map((o) => o.label),
              170,
            )}
            data={siteOptions}
            value={params.siteId ?? null}
            onChange={(v) => set({ siteId: v ?? undefined, machineId: undefined })}
          />
          <Select
            label="Equipment"
            placeholder="Any"
            clearable
            searchable
            w={fitWidth(
              machines.map((o) => o.label),
              200,
            )}
            data={machines}
            value={params.machineId ?? null}
            onChange={(v) => set({ machineId: v ?? undefined })}
          />
          <Select
            label="Sheet type"
            placeholder="Any"
            clearable
            w={fitWidth(
              typeOptions.map((o) => o.label),
              190,
            )}
            data={typeOptions}
            value={params.sheetType ?? null}
            onChange={(v) => set({ sheetType: v ?? undefined })}
          />
          {canCreate ? (
            <OwnerFilter
              mine={params.ownerId === user.id}
              onChange={(mine) => set({ ownerId: mine ? user.id : undefined })}
            />
          ) : null}
        </Group>
      </Paper>
      <Paper p={0}>
        {sheets.isPending ? (
          <Stack p="sm" gap="xs">
            {Array.from({ length: 6 }, (_, i) => (
              <Skeleton key={i} h={32} />
            ))}
          </Stack>
        ) : sheets.isError ? (
          <ErrorPanel error={sheets.error} onRetry={() => void sheets.refetch()} />
        ) : sheets.data.items.length === 0 ? (
          <Text p="lg" c="dimmed">
            No sheet matches these filters.
          </Text>
        ) : (
          <SheetsTable
            items={sheets.data.items}
            sort={params.sort ?? 'documentNumber'}
            order={params.order ?? 'asc'}
            onSort={onSort}
            selected={picked}
            onToggle={toggle}
          />
        )}
      </Paper>
      {sheets.data ? (
        <Group justify="space-between">
          <Text size="sm" c="dimmed" aria-live="polite">
            {sheets.data.total} sheet{sheets.data.total === 1 ? '' : 's'}
            {sheets.isFetching ? ' · updating…' : ''}
          </Text>
          <Pagination
            total={Math.max(1, Math.ceil(sheets.data.total / PAGE_SIZE))}
            value={params.page ?? 1}
            onChange={(p) => set({ page: String(p) })}
            size="sm"
            aria-label="Pages"
            getControlProps={(control) => ({
              'aria-label':
                control === 'previous'
                  ? 'Previous page'
                  : control === 'next'
                    ? 'Next page'
                    : `${control} page`,
            })}
          />
        </Group>
      ) : null}
      <CreateSheetDialog
        opened={createOpen || (canCreate && startOn !== null && positionsById.has(startOn))}
        onClose={closeCreate}
        positions={positionGroups(sites)}
        initialPositionId={startOn}
        sheetTypeFor={(id) => {
          const p = positionsById.get(id);
          return p ? suggestedSheetType(p) : null;
        }}
        onCreated={(sheet) => {
          setCreateOpen(false);
          navigate(`/sheets/${sheet.id}`);
        }}
      />
    </Page>
  );
}
