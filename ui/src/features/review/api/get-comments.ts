import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { commentListSchema, type CommentList } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { revisionKeys } from '../../../lib/query-keys';

export function getComments(revisionId: string, signal?: AbortSignal): Promise<CommentList> {
  return api.get(apiPath(apiRoutes.comments.list, { id: revisionId }), {
    schema: commentListSchema,
    signal,
  });
}

export function commentsQueryOptions(revisionId: string) {
  return queryOptions({
    queryKey: revisionKeys.comments(revisionId),
    queryFn: ({ signal }) => getComments(revisionId, signal),
  });
}

export function useComments(revisionId: string) {
  return useQuery(commentsQueryOptions(revisionId));
}
