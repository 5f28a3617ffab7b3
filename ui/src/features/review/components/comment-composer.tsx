import { useState } from 'react';
import { Button, Group, Stack, Text, Textarea } from '@mantine/core';
import type { CommentAnchor } from '@holdfast/shared';
import { errorMessage } from '../../../lib/api-client';
import { useCreateComment } from '../api/create-comment';

export interface CommentComposerProps {
  revisionId: string;
  anchor: CommentAnchor | null;
  /** What the comment will be pinned to, in words, for the field label. */
  target: string;
  onDone?: () => void;
  autoFocus?: boolean;
  /** Set to answer that comment: the reply hangs under it. */
  parentId?: string;
}

export function CommentComposer({
  revisionId,
  anchor,
  target,
  onDone,
  autoFocus,
  parentId,
}: CommentComposerProps) {
  const [body, setBody] = useState('');
  const create = useCreateComment(revisionId);
  const fieldError = create.error ? errorMessage(create.error) : undefined;
  const submit = () => {
    if (!body.trim()) return;
    create.mutate(parentId ? { body: body.trim(), parentId } : { body: body.trim(), anchor }, {
      onSuccess: () => {
        setBody('');
        onDone?.();
      },
    });
  };
  return (
    <Stack gap={6}>
      <Textarea
        label={parentId ? `Reply to ${target}` : `Comment on ${target}`}
        rows={2}
        value={body}
        onChange={(e) => setBody(e.currentTarget.value)}
        onKeyDown={(e) => {
          if (e.key === 'Enter' && (e.ctrlKey || e.metaKey)) submit();
        }}
        error={fieldError}
        data-autofocus={autoFocus || undefined}
        maxLength={4000}
      />
      <Group justify="space-between">
        <Text size="xs" c="dimmed">
          Ctrl+Enter posts
        </Text>
        <Button size="xs" onClick={submit} loading={create.isPending} disabled={!body.trim()}>
          {parentId ? 'Post reply' : 'Post comment'}
        </Button>
      </Group>
    </Stack>
  );
}
