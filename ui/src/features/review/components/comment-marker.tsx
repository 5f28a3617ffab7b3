import { ActionIcon, Badge, Popover, ScrollArea, Stack, Tooltip } from '@mantine/core';
import { IconMessage2, IconMessage2Plus } from '@tabler/icons-react';
import { useState } from 'react';
import type { Comment, CommentAnchor } from '@holdfast/shared';
import { CommentComposer } from './comment-composer';
import { CommentThread } from './comment-thread';

export interface CommentMarkerProps {
  revisionId: string;
  anchor: CommentAnchor;
  /** The field, step or check in words, e.g. 'Spring force'. */
  label: string;
  comments: Comment[];
  canComment: boolean;
  canResolve: boolean;
}

/**
 * The marker beside a field, step or check: shows how many open comments it has, and opens them
 * (and a box to add one) in place.
 */
export function CommentMarker({
  revisionId,
  anchor,
  label,
  comments,
  canComment,
  canResolve,
}: CommentMarkerProps) {
  const [opened, setOpened] = useState(false);
  const open = comments.filter((c) => !c.resolved).length;
  if (comments.length === 0 && !canComment) return null;
  const name =
    comments.length === 0
      ? `Comment on ${label}`
      : `${comments.length} comment${comments.length === 1 ? '' : 's'} on ${label}${open ? `, ${open} open` : ''}`;
  return (
    <Popover
      opened={opened}
      onChange={setOpened}
      width={340}
      position="bottom-end"
      shadow="md"
      trapFocus
      withArrow
    >
      <Popover.Target>
        <Tooltip label={name}>
          {comments.length === 0 ? (
            <ActionIcon
              size="sm"
              variant="subtle"
              color="gray"
              aria-label={name}
              onClick={() => setOpened((o) => !o)}
              data-comment-marker={`${anchor.kind}:${anchor.key}`}
            >
              <IconMessage2Plus size={14} aria-hidden />
            </ActionIcon>
          ) : (
            <Badge
              component="button"
              type="button"
              size="sm"
              color={open ? 'amber' : 'gray'}
              variant={open ? 'filled' : 'light'}
              leftSection={<IconMessage2 size={12} aria-hidden />}
              aria-label={name}
              onClick={() => setOpened((o) => !o)}
              style={{ cursor: 'pointer' }}
              data-comment-marker={`${anchor.kind}:${anchor.key}`}
            >
              {open || comments.length}
            </Badge>
          )}
        </Tooltip>
      </Popover.Target>
      <Popover.Dropdown>
        <ScrollArea.Autosize mah={420}>
          <Stack gap="sm">
            <CommentThread
              revisionId={revisionId}
              comments={comments}
              canResolve={canResolve}
              canComment={canComment}
            />
            {canComment ? (
              <CommentComposer revisionId={revisionId} anchor={anchor} target={label} autoFocus />
            ) : null}
          </Stack>
        </ScrollArea.Autosize>
      </Popover.Dropdown>
    </Popover>
  );
}
