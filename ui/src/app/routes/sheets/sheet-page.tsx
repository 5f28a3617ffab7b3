import { useEffect, useState } from 'react';
import { Anchor, Button, Drawer, Grid, Paper, Skeleton, Stack, Text, Title } from '@mantine/core';
import { useMediaQuery } from '@mantine/hooks';
import { IconArrowsDiff, IconCopyPlus, IconHistory } from '@tabler/icons-react';
import type { QueryClient } from '@tanstack/react-query';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import type { RevisionSummary, SheetDetail, User } from '@holdfast/shared';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { warmUpSheetType } from '../../../components/calc/utils/sheet-types';
import type { RouteHandle } from '../../../lib/route-handle';
import { hasRole, sessionStore, useCurrentUser } from '../../../lib/session';
import { revisionQueryOptions } from '../../../features/revisions/api/get-revision';
import { sheetQueryOptions, useSheet } from '../../../features/sheets/api/get-sheet';
import { NewRevisionDialog } from '../../../features/sheets/components/new-revision-dialog';
import { RevisionTimeline } from '../../../features/sheets/components/revision-timeline';
import { UnderReviewBanner } from '../../../features/criteria-review/components/under-review-banner';
import { RevisionView } from './revision-view';
import { SheetHeader } from './sheet-header';

export const handle: RouteHandle = { caution: true, wide: true, compactNav: true, title: 'Sheet' };

export function clientLoader(queryClient: QueryClient) {
  return async ({ params }: LoaderFunctionArgs) => {
    const sheet = await queryClient.ensureQueryData(sheetQueryOptions(params.sheetId!));
    const user = sessionStore.getState().user;
    // Only what this user may read: a viewer's or fitter's request for a draft is refused (403).
    const revisionId = user ? readableRevisionId(sheet, user, params.revisionId) : undefined;
    if (revisionId) void queryClient.prefetchQuery(revisionQueryOptions(revisionId));
    warmUpSheetType(sheet.sheetType);
    return null;
  };
}

const FROZEN = new Set(['approved', 'superseded']);

/**
 * What this user sees of the history: engineers and checkers every revision; everyone else
 * (viewers, fitters, admins) the released ones only, as the server lets them read
 * (canReadContent in server/src/revisions/revision-access.ts).
 */
export function visibleRevisions(sheet: SheetDetail, user: User): RevisionSummary[] {
  return readsDrafts(user) ? sheet.revisions : sheet.revisions.filter((r) => FROZEN.has(r.state));
}

const readsDrafts = (user: User) => hasRole(user, 'engineer', 'checker');

/** The revision the page opens on (the one asked for, else the latest the user may read). */
function shownRevisionId(sheet: SheetDetail, user: User, requested?: string): string | undefined {
  return requested ?? (readsDrafts(user) ? sheet.latest.id : sheet.approved?.id);
}

/** The revision the page shows, when the server lets this user read it; else nothing to fetch. */
export function readableRevisionId(
  sheet: SheetDetail,
  user: User,
  requested?: string,
): string | undefined {
  const id = shownRevisionId(sheet, user, requested);
  return visibleRevisions(sheet, user).some((r) => r.id === id) ? id : undefined;
}

export function Component() {
  const { sheetId = '', revisionId } = useParams();
  const user = useCurrentUser();
  const navigate = useNavigate();
  const query = useSheet(sheetId);
  const [newOpen, setNewOpen] = useState(false);
  const [historyOpen, setHistoryOpen] = useState(false);
  // The revision history sits beside the editor only on very wide screens; below that it folds
  // into a drawer so the inputs and the results get the width.
  const historyInline = useMediaQuery('(min-width: 1800px)', false) ?? false;
  useEffect(() => setHistoryOpen(false), [revisionId]);

  if (query.isPending) {
    return (
      <Stack>
        <Skeleton h={110} />
        <Skeleton h={420} />
      </Stack>
    );
  }
  if (query.isError) return <ErrorPanel error={query.error} onRetry={() => void query.refetch()} />;

  const sheet = query.data;
  const revisions = visibleRevisions(sheet, user);
  const selectedId = shownRevisionId(sheet, user, revisionId);
  const selected = revisions.find((r) => r.id === selectedId);
  const index = revisions.findIndex((r) => r.id === selectedId);
  const previous = index > 0 ? revisions[index - 1] : undefined;
  const latest = sheet.revisions[sheet.revisions.length - 1];
  const canStartRevision =
    (user.role === 'engineer' || user.role === 'checker') &&
    latest !== undefined &&
    FROZEN.has(latest.state);

  return (
    <Stack gap="md">
      <SheetHeader
        sheet={sheet}
        revision={selected}
        actions={
          <>
            {previous && selected ? (
              <Button
                variant="default"
                size="sm"
                component={Link}
                to={`/sheets/${sheet.id}/compare?from=${previous.id}&to=${selected.id}`}
                leftSection={<IconArrowsDiff size={16} aria-hidden />}
              >
                Compare with {previous.label}
              </Button>
            ) : null}
            {historyInline || revisions.length === 0 ? null : (
              <Button
                variant="default"
                size="sm"
                leftSection={<IconHistory size={16} aria-hidden />}
                onClick={() => setHistoryOpen(true)}
              >
                Revisions ({revisions.length})
              </Button>
            )}
            <Button
              variant="default"
              size="sm"
              component={Link}
              to={`/sheets/${sheet.id}/audit`}
              leftSection={<IconHistory size={16} aria-hidden />}
            >
              Audit trail
            </Button>
            {canStartRevision ? (
              // Outlined in the app's colour: the light variant read as greyed out, like a
              // disabled button, beside the plain ones.
              <Button
                size="sm"
                variant="outline"
                leftSection={<IconCopyPlus size={16} aria-hidden />}
                onClick={() => setNewOpen(true)}
              >
                New revision
              </Button>
            ) : null}
          </>
        }
      />
      {sheet.approved && sheet.approved.id !== selectedId ? (
        // The approval in force may be under review while another revision is on screen.
        <UnderReviewBanner
          revisionId={sheet.approved.id}
          approved
          revisionLabel={sheet.approved.label}
        />
      ) : null}
      <Grid gap="md">
        <Grid.Col span={historyInline ? 'auto' : 12} style={{ minWidth: 0 }}>
          {selectedId && selected ? (
            <RevisionView key={selectedId} revisionId={selectedId} user={user} />
          ) : (
            <Paper p="lg">
              <Text>
                {readsDrafts(user) ? (
                  'This revision is not part of this sheet.'
                ) : sheet.approved ? (
                  // A link to a revision not yet approved (or not this sheet's): offer the one in force.
                  <>
                    Only engineers and checkers see a revision before it is approved.{' '}
                    <Anchor
                      component={Link}
                      to={`/sheets/${sheet.id}/revisions/${sheet.approved.id}`}
                    >
                      Open revision {sheet.approved.label}, the one in force
                    </Anchor>
                    .
                  </>
                ) : (
                  'Drafts are visible to engineers and checkers only; this sheet has no approved revision yet.'
                )}
              </Text>
            </Paper>
          )}
        </Grid.Col>
        {historyInline ? (
          <Grid.Col span="content" maw={280}>
            <Paper p="md" component="aside" aria-labelledby="history-title">
              <Title order={2} size="h5" id="history-title" mb="sm">
                Revisions
              </Title>
              <RevisionTimeline sheetId={sheet.id} revisions={revisions} selectedId={selectedId} />
            </Paper>
          </Grid.Col>
        ) : null}
      </Grid>
      <Drawer
        opened={historyOpen && !historyInline}
        onClose={() => setHistoryOpen(false)}
        position="right"
        size="sm"
        title="Revisions"
      >
        <RevisionTimeline sheetId={sheet.id} revisions={revisions} selectedId={selectedId} />
      </Drawer>
      <NewRevisionDialog
        sheetId={sheet.id}
        opened={newOpen}
        onClose={() => setNewOpen(false)}
        onCreated={(id) => {
          setNewOpen(false);
          navigate(`/sheets/${sheet.id}/revisions/${id}`);
        }}
      />
    </Stack>
  );
}
