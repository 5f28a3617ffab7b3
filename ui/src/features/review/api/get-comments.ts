import { queryOptions, useQuery } from '@tanstack/react-query';
import { commentListSchema, type CommentList } from '@holdfast/shared';
import { api } from '../../../lib/api-client';

/** Comments hang off their revision's key, so refreshing a revision refreshes them too. */
export const commentsKey = (revisionId: string) =>
  ['revisions', 'detail', revisionId, 'comments'] as const;

export function getComments(revisionId: string, signal?: AbortSignal): Promise<CommentList> {
  return api.get(`/revisions/${revisionId}/comments`, { schema: commentListSchema, signal });
}

export function commentsQueryOptions(revisionId: string) {
  return queryOptions({
    queryKey: commentsKey(revisionId),
    queryFn: ({ signal }) => getComments(revisionId, signal),
  });
}

export function useComments(revisionId: string) {
  return useQuery(commentsQueryOptions(revisionId));
}
