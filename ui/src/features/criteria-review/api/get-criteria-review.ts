import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { revisionCriteriaReviewSchema, type RevisionCriteriaReview } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { reviewKeys } from '../../../lib/query-keys';

export function getCriteriaReview(
  revisionId: string,
  signal?: AbortSignal,
): Promise<RevisionCriteriaReview> {
  return api.get(apiPath(apiRoutes.reviews.ofRevision, { id: revisionId }), {
    schema: revisionCriteriaReviewSchema,
    signal,
  });
}

export function criteriaReviewQueryOptions(revisionId: string) {
  return queryOptions({
    queryKey: reviewKeys.revision(revisionId),
    queryFn: ({ signal }) => getCriteriaReview(revisionId, signal),
  });
}

export function useCriteriaReview(revisionId: string, enabled = true) {
  return useQuery({ ...criteriaReviewQueryOptions(revisionId), enabled });
}
