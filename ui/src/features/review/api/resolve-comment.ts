import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { commentSchema, type Comment } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { commentsQueryOptions } from './get-comments';

export function resolveComment(commentId: string, resolved: boolean): Promise<Comment> {
  return api.patch(apiPath(apiRoutes.comments.update, { id: commentId }), {
    body: { resolved },
    schema: commentSchema,
  });
}

export function useResolveComment(revisionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ commentId, resolved }: { commentId: string; resolved: boolean }) =>
      resolveComment(commentId, resolved),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: commentsQueryOptions(revisionId).queryKey }),
  });
}
