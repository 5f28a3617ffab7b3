import { Anchor, Paper, Skeleton, Stack, Text, Title } from '@mantine/core';
import type { Comment } from '@holdfast/shared';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { useComments } from '../api/get-comments';
import { anchorKindWord } from '../utils/anchors';
import { CommentComposer } from './comment-composer';
import { CommentThread } from './comment-thread';

export interface CommentsPanelProps {
  revisionId: string;
  canComment: boolean;
  canResolve: boolean;
  /** Name of an anchored item, e.g. the field label for an input key. */
  describe: (c: Comment) => string;
  /** Brings the anchored item into view. */
  onReveal?: (c: Comment) => void;
}

/** Every comment on the revision, open ones first, each saying where it is pinned. */
export function CommentsPanel({
  revisionId,
  canComment,
  canResolve,
  describe,
  onReveal,
}: CommentsPanelProps) {
  const query = useComments(revisionId);
  return (
    <Paper p="md" component="section" aria-labelledby="comments-title">
      <Title order={2} size="h5" id="comments-title" mb="sm">
        Review comments
      </Title>
      {query.isPending ? (
        <Stack gap="xs">
          <Skeleton h={48} />
          <Skeleton h={48} />
        </Stack>
      ) : query.isError ? (
        <ErrorPanel error={query.error} onRetry={() => void query.refetch()} />
      ) : (
        <Stack gap="md">
          {query.data.items.length === 0 ? (
            <Text size="sm" c="dimmed">
              No comments on this revision.
            </Text>
          ) : null}
          {[...query.data.items]
            .sort((a, b) => Number(a.resolved) - Number(b.resolved))
            .map((c) => (
              <Stack key={c.id} gap={4}>
                {c.anchor ? (
                  <Text size="xs" c="dimmed">
                    On {anchorKindWord[c.anchor.kind]}:{' '}
                    {onReveal ? (
                      <Anchor
                        component="button"
                        type="button"
                        size="xs"
                        onClick={() => onReveal(c)}
                      >
                        {describe(c)}
                      </Anchor>
                    ) : (
                      describe(c)
                    )}
                  </Text>
                ) : (
                  <Text size="xs" c="dimmed">
                    On the whole revision
                  </Text>
                )}
                <CommentThread
                  revisionId={revisionId}
                  comments={[c]}
                  canResolve={canResolve}
                  canComment={canComment}
                />
              </Stack>
            ))}
          {canComment ? (
            <CommentComposer revisionId={revisionId} anchor={null} target="the whole revision" />
          ) : null}
        </Stack>
      )}
    </Paper>
  );
}
