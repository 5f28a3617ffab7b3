import { useState } from 'react';
import { Badge, Button, Group, Paper, Stack, Text } from '@mantine/core';
import { IconCircleCheck, IconCornerDownRight } from '@tabler/icons-react';
import type { Comment } from '@holdfast/shared';
import { errorMessage } from '../../../lib/api-client';
import { useResolveComment } from '../api/resolve-comment';
import { CommentComposer } from './comment-composer';
import { isoDayTime } from '../../../lib/dates';

export interface CommentThreadProps {
  revisionId: string;
  comments: Comment[];
  canResolve: boolean;
  /** Whether the user may answer a comment (a reply hangs under it). */
  canComment?: boolean;
}

const when = (iso: string) => isoDayTime(iso);

function Byline({ c }: { c: Comment }) {
  return (
    <Text size="xs" fw={600}>
      {c.author.displayName}{' '}
      <Text span size="xs" c="dimmed" fw={400}>
        {when(c.createdAt)}
      </Text>
    </Text>
  );
}

/** Comments in the order they were made, each with its replies under it; resolved ones step back. */
export function CommentThread({
  revisionId,
  comments,
  canResolve,
  canComment = false,
}: CommentThreadProps) {
  const resolve = useResolveComment(revisionId);
  const [replyTo, setReplyTo] = useState<string | null>(null);
  if (comments.length === 0) return null;
  return (
    <Stack gap="xs">
      {comments.map((c) => (
        <Paper
          key={c.id}
          p="xs"
          bg={c.resolved ? 'gray.0' : undefined}
          data-comment={c.id}
          data-resolved={c.resolved}
        >
          <Group justify="space-between" gap="xs" wrap="nowrap" mb={2}>
            <Byline c={c} />
            {c.resolved ? (
              <Badge size="xs" color="pass" leftSection={<IconCircleCheck size={10} aria-hidden />}>
                Resolved
              </Badge>
            ) : null}
          </Group>
          <Text size="sm" style={{ whiteSpace: 'pre-wrap' }}>
            {c.body}
          </Text>
          {(c.replies ?? []).length > 0 ? (
            <Stack
              gap={6}
              mt={6}
              ml="sm"
              pl="sm"
              component="ul"
              aria-label={`Replies to ${c.author.displayName}`}
              style={{ listStyle: 'none', borderLeft: '2px solid var(--mantine-color-gray-4)' }}
            >
              {(c.replies ?? []).map((r) => (
                <li key={r.id} data-reply={r.id}>
                  <Byline c={r} />
                  <Text size="sm" style={{ whiteSpace: 'pre-wrap' }}>
                    {r.body}
                  </Text>
                </li>
              ))}
            </Stack>
          ) : null}
          {replyTo === c.id ? (
            <Stack mt="xs" ml="sm">
              <CommentComposer
                revisionId={revisionId}
                anchor={null}
                parentId={c.id}
                target={c.author.displayName}
                autoFocus
                onDone={() => setReplyTo(null)}
              />
            </Stack>
          ) : null}
          {canResolve || canComment ? (
            <Group justify="flex-end" mt={4} gap={4}>
              {canComment && replyTo !== c.id ? (
                <Button
                  size="compact-xs"
                  variant="subtle"
                  leftSection={<IconCornerDownRight size={12} aria-hidden />}
                  onClick={() => setReplyTo(c.id)}
                >
                  Reply
                </Button>
              ) : null}
              {canResolve ? (
                <Button
                  size="compact-xs"
                  variant="subtle"
                  loading={resolve.isPending && resolve.variables?.commentId === c.id}
                  onClick={() => resolve.mutate({ commentId: c.id, resolved: !c.resolved })}
                >
                  {c.resolved ? 'Reopen' : 'Mark resolved'}
                </Button>
              ) : null}
            </Group>
          ) : null}
        </Paper>
      ))}
      {resolve.isError ? (
        <Text size="xs" c="fail.8" role="alert">
          {errorMessage(resolve.error)}
        </Text>
      ) : null}
    </Stack>
  );
}
