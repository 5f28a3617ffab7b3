import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { revisionChangesSchema, type RevisionChanges } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { revisionKeys } from '../../../lib/query-keys';

export function getRevisionChanges(id: string, signal?: AbortSignal): Promise<RevisionChanges> {
  return api.get(apiPath(apiRoutes.revisions.changes, { id }), {
    schema: revisionChangesSchema,
    signal,
  });
}

export function revisionChangesQueryOptions(id: string) {
  return queryOptions({
    queryKey: revisionKeys.changes(id),
    queryFn: ({ signal }) => getRevisionChanges(id, signal),
  });
}

/** Inputs changed since the last submission the checker saw. */
export function useRevisionChanges(id: string, enabled = true) {
  return useQuery({ ...revisionChangesQueryOptions(id), enabled });
}
