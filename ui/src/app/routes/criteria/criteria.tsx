import { useEffect, useState } from 'react';
import {
  Alert,
  Button,
  Flex,
  Group,
  NavLink,
  Paper,
  Select,
  SimpleGrid,
  Skeleton,
  Stack,
  Text,
  TextInput,
  Title,
} from '@mantine/core';
import type { QueryClient } from '@tanstack/react-query';
import { useSearchParams } from 'react-router-dom';
import type { CriterionValueInput } from '@holdfast/shared';
import { Page } from '../../../components/layouts/page';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { errorMessage, isApiRequestError } from '../../../lib/api-client';
import type { RouteHandle } from '../../../lib/route-handle';
import { useCurrentUser } from '../../../lib/session';
import { useCriteriaSet } from '../../../features/criteria/api/get-criteria-set';
import {
  criteriaSetsQueryOptions,
  useCriteriaSets,
} from '../../../features/criteria/api/get-criteria-sets';
import { usePublishCriteriaVersion } from '../../../features/criteria/api/publish-criteria-version';
import { CriteriaValuesTable } from '../../../features/criteria/components/criteria-values-table';
import { ImpactList } from '../../../features/criteria/components/impact-list';
import { ConfirmValueDialog } from '../../../features/criteria/components/confirm-value-dialog';
import { CreateCriteriaSetDialog } from '../../../features/criteria/components/create-criteria-set-dialog';
import { isoDay } from '../../../lib/dates';

export const handle: RouteHandle = { title: 'Criteria sets', wide: true, caution: true };

export function clientLoader(queryClient: QueryClient) {
  return async () => {
    await queryClient.ensureQueryData(criteriaSetsQueryOptions());
    return null;
  };
}

export function Component() {
  const user = useCurrentUser();
  const sets = useCriteriaSets();
  const [search, setSearch] = useSearchParams();
  const selected = search.get('set') ?? sets.data?.items[0]?.id ?? '';
  const version = search.get('version') ? Number(search.get('version')) : undefined;
  const detail = useCriteriaSet(selected, version);
  const publish = usePublishCriteriaVersion(selected);
  const [editing, setEditing] = useState<CriterionValueInput[] | null>(null);
  const [note, setNote] = useState('');
  const [impactVersion, setImpactVersion] = useState<number | null>(null);
  const [confirming, setConfirming] = useState<CriterionValueInput | null>(null);
  const [creating, setCreating] = useState(false);
  const canConfirm = user.role === 'admin' || user.role === 'checker';
  useEffect(() => {
    setEditing(null);
    setImpactVersion(null);
  }, [selected]);

  const go = (patch: Record<string, string | undefined>) =>
    setSearch((prev) => {
      const next = new URLSearchParams(prev);
      for (const [k, v] of Object.entries(patch)) {
        if (v) next.set(k, v);
        else next.delete(k);
      }
      return next;
    });

  const doPublish = () => {
    if (!editing) return;
    publish.mutate(
      { values: editing, note },
      {
        onSuccess: (d) => {
          setEditing(null);
          setNote('');
          setImpactVersion(d.version);
          go({ version: undefined });
        },
      },
    );
  };
  const publishFields = isApiRequestError(publish.error) ? publish.error.fieldErrors() : {};
  const noteError = publishFields.note;
  const valueErrors = Object.fromEntries(
    Object.entries(publishFields)
      .filter(([k]) => k.startsWith('values.'))
      .map(([k, m]) => [k.slice('values.'.length), m]),
  );

  return (
    <Page
      title="Criteria sets"
      description="The acceptance limits the checks use, each with its source. Publishing a version never changes approved sheets; the impact list shows which no longer pass."
    >
      {sets.isPending ? (
        <Skeleton h={240} />
      ) : sets.isError ? (
        <ErrorPanel error={sets.error} onRetry={() => void sets.refetch()} />
      ) : (
        // Side by side only where the values table (760 px and more) fits beside the list; on
        // narrower screens the list goes on top, so the sources are never scrolled out of view.
        <Flex
          direction={{ base: 'column', xl: 'row' }}
          align={{ base: 'stretch', xl: 'flex-start' }}
          gap="md"
        >
          <Paper
            p="xs"
            w={{ base: '100%', xl: 240 }}
            component="nav"
            aria-label="Criteria sets"
            style={{ flexShrink: 0 }}
          >
            <SimpleGrid cols={{ base: 1, sm: 3, xl: 1 }} spacing={4} verticalSpacing={4}>
              {sets.data.items.map((s) => (
                <NavLink
                  key={s.id}
                  active={s.id === selected}
                  label={s.name}
                  description={`version ${s.version}`}
                  onClick={() => go({ set: s.id, version: undefined })}
                />
              ))}
            </SimpleGrid>
          </Paper>
          <Stack style={{ flex: 1, minWidth: 0 }} gap="md">
            {detail.isPending ? (
              <Skeleton h={300} />
            ) : detail.isError ? (
              <ErrorPanel error={detail.error} onRetry={() => void detail.refetch()} />
            ) : (
              <Paper p="md">
                <Group justify="space-between" align="flex-start" mb="sm">
                  <div>
                    <Title order={2} size="h4">
                      {detail.data.name}
                    </Title>
                    <Text size="sm" c="dimmed">
                      {detail.data.description}
                    </Text>
                    <Text size="xs" c="dimmed" mt={4}>
                      Version {detail.data.version}, published {isoDay(detail.data.publishedAt)}
                      {detail.data.publishedBy ? ` by ${detail.data.publishedBy.displayName}` : ''}
                      {detail.data.note ? ` — ${detail.data.note}` : ''}
                    </Text>
                  </div>
                  <Group gap="xs" align="flex-end">
                    <Select
                      label="Version"
                      size="xs"
                      w={110}
                      data={detail.data.versions.map((v) => ({
                        value: String(v.version),
                        label: `v${v.version}`,
                      }))}
                      value={String(detail.data.version)}
                      onChange={(v) => go({ version: v ?? undefined })}
                      allowDeselect={false}
                    />
                    {user.role === 'admin' && !editing ? (
                      <Button size="xs" variant="default" onClick={() => setCreating(true)}>
                        New set from this one
                      </Button>
                    ) : null}
                    {user.role === 'admin' && !editing ? (
                      <Button
                        size="xs"
                        onClick={() => setEditing(detail.data.values.map((v) => ({ ...v })))}
                      >
                        Draft a new version
                      </Button>
                    ) : null}
                  </Group>
                </Group>
                <CriteriaValuesTable
                  values={editing ?? detail.data.values}
                  errors={valueErrors}
                  confirmations={editing ? [] : detail.data.confirmations}
                  onConfirm={canConfirm && !editing ? setConfirming : undefined}
                  onEdit={
                    editing
                      ? (i, patch) =>
                          setEditing(
                            (cur) => cur && cur.map((v, j) => (j === i ? { ...v, ...patch } : v)),
                          )
                      : undefined
                  }
                />
                {editing ? (
                  <Stack mt="md" gap="xs">
                    <TextInput
                      label="What changed and why"
                      required
                      value={note}
                      onChange={(e) => setNote(e.currentTarget.value)}
                      error={noteError}
                    />
                    {publish.isError && !noteError ? (
                      <Alert color="fail" role="alert">
                        {errorMessage(publish.error)}
                      </Alert>
                    ) : null}
                    <Group justify="flex-end">
                      <Button variant="default" onClick={() => setEditing(null)}>
                        Discard draft
                      </Button>
                      <Button
                        onClick={doPublish}
                        loading={publish.isPending}
                        disabled={!note.trim()}
                      >
                        Publish version {detail.data.versions.length + 1}
                      </Button>
                    </Group>
                  </Stack>
                ) : null}
              </Paper>
            )}
            {detail.data ? (
              <>
                <ConfirmValueDialog
                  setId={detail.data.id}
                  version={detail.data.version}
                  value={confirming}
                  onClose={() => setConfirming(null)}
                />
                <CreateCriteriaSetDialog
                  opened={creating}
                  onClose={() => setCreating(false)}
                  startFrom={detail.data.values}
                  startName={detail.data.name}
                  onCreated={(id) => go({ set: id, version: undefined })}
                />
              </>
            ) : null}
            {impactVersion ? (
              <ImpactList setId={selected} version={impactVersion} />
            ) : detail.data && user.role === 'admin' ? (
              <Group>
                <Button
                  variant="light"
                  size="xs"
                  onClick={() => setImpactVersion(detail.data.version)}
                >
                  Check approved sheets against version {detail.data.version}
                </Button>
              </Group>
            ) : null}
          </Stack>
        </Flex>
      )}
    </Page>
  );
}
