import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { underReviewQueueSchema, type UnderReviewQueue } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { reviewKeys } from '../../../lib/query-keys';

export function getUnderReviewQueue(signal?: AbortSignal): Promise<UnderReviewQueue> {
  return api.get(apiPath(apiRoutes.reviews.queue), { schema: underReviewQueueSchema, signal });
}

export function underReviewQueueQueryOptions() {
  return queryOptions({
    queryKey: reviewKeys.queue(),
    queryFn: ({ signal }) => getUnderReviewQueue(signal),
  });
}

export function useUnderReviewQueue() {
  return useQuery(underReviewQueueQueryOptions());
}
