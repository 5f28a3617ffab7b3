import { queryOptions, useQuery } from '@tanstack/react-query';
import { dueInspectionsSchema, type DueInspections } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { fieldApi } from './paths';
import { fieldRecordKeys } from './sign-field-record';

export function getDueInspections(signal?: AbortSignal): Promise<DueInspections> {
  return api.get(fieldApi('due'), { schema: dueInspectionsSchema, signal });
}

export function dueInspectionsQueryOptions() {
  return queryOptions({
    queryKey: [...fieldRecordKeys.all, 'due'] as const,
    queryFn: ({ signal }) => getDueInspections(signal),
  });
}

export function useDueInspections() {
  return useQuery(dueInspectionsQueryOptions());
}
