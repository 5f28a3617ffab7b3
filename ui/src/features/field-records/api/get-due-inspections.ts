import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { dueInspectionsSchema, type DueInspections } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { fieldRecordKeys } from '../../../lib/query-keys';

export function getDueInspections(signal?: AbortSignal): Promise<DueInspections> {
  return api.get(apiPath(apiRoutes.fieldRecords.due), { schema: dueInspectionsSchema, signal });
}

export function dueInspectionsQueryOptions() {
  return queryOptions({
    queryKey: fieldRecordKeys.due(),
    queryFn: ({ signal }) => getDueInspections(signal),
  });
}

export function useDueInspections() {
  return useQuery(dueInspectionsQueryOptions());
}
