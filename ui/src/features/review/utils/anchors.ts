import type { Comment, CommentAnchor } from '@holdfast/shared';

export type AnchorKind = CommentAnchor['kind'];

export function anchorId(anchor: CommentAnchor): string {
  return `${anchor.kind}:${anchor.key}`;
}

/** Comments grouped by what they are pinned to; unpinned ones under 'general'. */
export function groupByAnchor(comments: Comment[]): Map<string, Comment[]> {
  const map = new Map<string, Comment[]>();
  for (const c of comments) {
    const id = c.anchor ? anchorId(c.anchor) : 'general';
    const list = map.get(id) ?? [];
    list.push(c);
    map.set(id, list);
  }
  return map;
}

export const anchorKindWord: Record<AnchorKind, string> = {
  input: 'input',
  step: 'derivation step',
  check: 'check',
};
