import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  revisionCriteriaReviewSchema,
  type ReviewDispositionInput,
  type RevisionCriteriaReview,
} from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { reviewKeys } from '../../../lib/query-keys';

export function disposeReview(
  revisionId: string,
  input: ReviewDispositionInput,
): Promise<RevisionCriteriaReview> {
  return api.post(apiPath(apiRoutes.reviews.dispose, { id: revisionId }), {
    body: input,
    schema: revisionCriteriaReviewSchema,
  });
}

export function useDisposeReview(revisionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ReviewDispositionInput) => disposeReview(revisionId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: reviewKeys.all }),
  });
}
