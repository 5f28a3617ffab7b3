import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { commentSchema, type Comment, type CreateCommentInput } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { commentsQueryOptions } from './get-comments';

export function createComment(revisionId: string, input: CreateCommentInput): Promise<Comment> {
  return api.post(apiPath(apiRoutes.comments.create, { id: revisionId }), {
    body: input,
    schema: commentSchema,
  });
}

export function useCreateComment(revisionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateCommentInput) => createComment(revisionId, input),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: commentsQueryOptions(revisionId).queryKey }),
  });
}
