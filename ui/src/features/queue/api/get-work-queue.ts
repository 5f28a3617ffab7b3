import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { workQueueSchema, type WorkQueue } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { workQueueKeys } from '../../../lib/query-keys';

export function getWorkQueue(signal?: AbortSignal): Promise<WorkQueue> {
  return api.get(apiPath(apiRoutes.workQueue.mine), { schema: workQueueSchema, signal });
}

export function workQueueQueryOptions() {
  return queryOptions({
    queryKey: workQueueKeys.all,
    queryFn: ({ signal }) => getWorkQueue(signal),
  });
}

export function useWorkQueue() {
  return useQuery(workQueueQueryOptions());
}
