import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { revisionSchema, type Revision } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { revisionKeys } from '../../../lib/query-keys';

export function getRevision(id: string, signal?: AbortSignal): Promise<Revision> {
  return api.get(apiPath(apiRoutes.revisions.detail, { id }), { schema: revisionSchema, signal });
}

export function revisionQueryOptions(id: string) {
  return queryOptions({
    queryKey: revisionKeys.detail(id),
    queryFn: ({ signal }) => getRevision(id, signal),
  });
}

export function useRevision(id: string) {
  return useQuery(revisionQueryOptions(id));
}
