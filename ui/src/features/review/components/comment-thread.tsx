import { Badge, Button, Group, Paper, Stack, Text } from '@mantine/core';
import { IconCircleCheck } from '@tabler/icons-react';
import type { Comment } from '@holdfast/shared';
import { errorMessage } from '../../../lib/api-client';
import { useResolveComment } from '../api/resolve-comment';

export interface CommentThreadProps {
  revisionId: string;
  comments: Comment[];
  canResolve: boolean;
}

/** Comments in the order they were made; resolved ones stay readable but step back. */
export function CommentThread({ revisionId, comments, canResolve }: CommentThreadProps) {
  const resolve = useResolveComment(revisionId);
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
            <Text size="xs" fw={600}>
              {c.author.displayName}{' '}
              <Text span size="xs" c="dimmed" fw={400}>
                {new Date(c.createdAt).toLocaleString('en-GB', {
                  dateStyle: 'medium',
                  timeStyle: 'short',
                })}
              </Text>
            </Text>
            {c.resolved ? (
              <Badge size="xs" color="pass" leftSection={<IconCircleCheck size={10} aria-hidden />}>
                Resolved
              </Badge>
            ) : null}
          </Group>
          <Text size="sm" style={{ whiteSpace: 'pre-wrap' }} c={c.resolved ? 'dimmed' : undefined}>
            {c.body}
          </Text>
          {(c.replies ?? []).map((r) => (
            <Text
              key={r.id}
              size="sm"
              pl="sm"
              mt={4}
              style={{ borderLeft: '2px solid var(--mantine-color-gray-3)' }}
            >
              <strong>{r.author.initials}:</strong> {r.body}
            </Text>
          ))}
          {canResolve ? (
            <Group justify="flex-end" mt={4}>
              <Button
                size="compact-xs"
                variant="subtle"
                loading={resolve.isPending && resolve.variables?.commentId === c.id}
                onClick={() => resolve.mutate({ commentId: c.id, resolved: !c.resolved })}
              >
                {c.resolved ? 'Reopen' : 'Mark resolved'}
              </Button>
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
