import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { Alert, Grid, Skeleton, Stack, Tabs } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';
import type { Comment, User } from '@holdfast/shared';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { AttachmentsPanel } from '../../../features/attachments/components/attachments-panel';
import { fieldDomId } from '../../../components/calc/components/field-input';
import { ResultsPanel } from '../../../components/calc/components/results-panel';
import { findSheetType, warmUpSheetType } from '../../../components/calc/utils/sheet-types';
import { useCriteriaSet } from '../../../features/criteria/api/get-criteria-set';
import { useComments } from '../../../features/review/api/get-comments';
import { CommentMarker } from '../../../features/review/components/comment-marker';
import { CommentsPanel } from '../../../features/review/components/comments-panel';
import { groupByAnchor } from '../../../features/review/utils/anchors';
import { useRevision } from '../../../features/revisions/api/get-revision';
import {
  RevisionWorkbench,
  type WorkbenchContext,
} from '../../../features/revisions/components/revision-workbench';
import { UnderReviewBanner } from '../../../features/criteria-review/components/under-review-banner';
import { ChangesPanel } from '../../../features/revisions/components/changes-panel';
import { RevisionActions } from './revision-actions';
import { ReviewSummary } from './review-summary';
import { hasRole } from '../../../lib/session';

/** One revision: the live workbench with review markers in place, then comments and files. */
export function RevisionView({ revisionId, user }: { revisionId: string; user: User }) {
  const query = useRevision(revisionId);
  const [tab, setTab] = useState<string | null>('calc');
  const revision = query.data;
  const sheetType = revision ? findSheetType(revision.sheetType) : undefined;
  const typeId = revision?.sheetType;
  useEffect(() => {
    if (typeId) warmUpSheetType(typeId);
  }, [typeId]);
  const criteria = useCriteriaSet(revision?.criteriaSetId ?? '', revision?.criteriaSetVersion);
  const frozen = revision ? revision.state === 'approved' || revision.state === 'superseded' : true;
  const commentsQuery = useComments(revisionId);
  const comments = useMemo(() => commentsQuery.data?.items ?? [], [commentsQuery.data]);
  const grouped = useMemo(() => groupByAnchor(comments), [comments]);
  // Comments, files and the changes since the last check are the review's: engineers and checkers
  // (the server's @Roles('engineer') on comments and uploads admits checkers too).
  const reviewer = hasRole(user, 'engineer', 'checker');
  const canComment = reviewer && !frozen;

  const fieldLabel = useCallback(
    (key: string) => sheetType?.fields.find((f) => f.key === key)?.label ?? key,
    [sheetType],
  );
  const stepLabel = useCallback(
    (id: string) => revision?.evaluation?.derivation.find((s) => s.id === id)?.label ?? id,
    [revision],
  );
  const describe = (c: Comment) =>
    !c.anchor
      ? ''
      : c.anchor.kind === 'input'
        ? fieldLabel(c.anchor.key)
        : c.anchor.kind === 'step'
          ? stepLabel(c.anchor.key)
          : c.anchor.key;
  const reveal = (c: Comment) => {
    if (c.anchor?.kind !== 'input') return;
    const key = c.anchor.key;
    setTab('calc');
    // The calculation tab mounts on switch; reach the field once it is in the document.
    setTimeout(() => {
      const el = document.getElementById(fieldDomId(key));
      el?.scrollIntoView({ block: 'center' });
      el?.focus();
    }, 50);
  };

  // The renderers are memoised: every field, check and step row is memoised on them, so a new
  // function after each autosave (the revision query updates) would render every row and marker
  // again in the middle of typing.
  // Step labels are read when a marker renders, from the newest revision: a saved draft carries a
  // new evaluation object each time, which must not renew the renderers.
  const latestSteps = useRef(revision?.evaluation?.derivation);
  latestSteps.current = revision?.evaluation?.derivation;
  const markers = useMemo(() => {
    const marker =
      (kind: 'input' | 'step' | 'check', label: (k: string) => string) => (key: string) => (
        <CommentMarker
          revisionId={revisionId}
          anchor={{ kind, key }}
          label={label(key)}
          comments={grouped.get(`${kind}:${key}`) ?? []}
          canComment={canComment}
          canResolve={canComment}
        />
      );
    const stepOf = (id: string) => latestSteps.current?.find((s) => s.id === id)?.label ?? id;
    return {
      field: marker('input', fieldLabel),
      step: marker('step', stepOf),
      check: marker('check', (k) => k),
    };
  }, [revisionId, grouped, canComment, fieldLabel]);
  const openComments = comments.filter((c) => !c.resolved).length;
  const renderActions = useCallback(
    (ctx: WorkbenchContext) =>
      revision ? (
        <RevisionActions revision={revision} ctx={ctx} openComments={openComments} />
      ) : null,
    [revision, openComments],
  );

  if (query.isPending) return <Skeleton h={420} />;
  if (query.isError || !revision)
    return <ErrorPanel error={query.error} onRetry={() => void query.refetch()} />;

  return (
    <>
      <UnderReviewBanner revisionId={revisionId} approved={revision.state === 'approved'} />
      <Tabs value={tab} onChange={setTab} keepMounted={false}>
        <Tabs.List mb="md">
          <Tabs.Tab value="calc">Calculation</Tabs.Tab>
          <Tabs.Tab value="review">
            Review and files{openComments > 0 ? ` (${openComments} open)` : ''}
          </Tabs.Tab>
        </Tabs.List>
        <Tabs.Panel value="calc">
          {sheetType ? (
            criteria.isError && revision.canEdit ? (
              <ErrorPanel
                title="The acceptance criteria could not be loaded"
                error={criteria.error}
                onRetry={() => void criteria.refetch()}
              />
            ) : (
              <RevisionWorkbench
                revision={revision}
                sheetType={sheetType}
                criteria={criteria.data}
                renderActions={renderActions}
                renderFieldAside={markers.field}
                renderStepAside={markers.step}
                renderCheckAside={markers.check}
              />
            )
          ) : (
            <Stack>
              <Alert
                color="amber"
                icon={<IconAlertTriangle size={18} />}
                title="Sheet type not available here"
              >
                This build’s calculation core does not know the sheet type “{revision.sheetType}”.
                The stored results are shown; inputs cannot be edited.
              </Alert>
              <ResultsPanel
                evaluation={revision.evaluation}
                sections={[]}
                unitSystem={revision.unitSystem}
                origin="Stored by the server"
              />
            </Stack>
          )}
        </Tabs.Panel>
        <Tabs.Panel value="review">
          <Stack gap="md">
            <ReviewSummary revision={revision} openComments={openComments} />
            {reviewer ? <ChangesPanel revisionId={revisionId} /> : null}
            <Grid gap="md">
              <Grid.Col span={{ base: 12, md: 7 }}>
                <CommentsPanel
                  revisionId={revisionId}
                  canComment={canComment}
                  canResolve={canComment}
                  describe={describe}
                  onReveal={reveal}
                />
              </Grid.Col>
              <Grid.Col span={{ base: 12, md: 5 }}>
                <AttachmentsPanel revisionId={revisionId} canUpload={canComment} />
              </Grid.Col>
            </Grid>
          </Stack>
        </Tabs.Panel>
      </Tabs>
    </>
  );
}
