import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { fieldFormSchema, type FieldForm } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { fieldFormKeys } from '../../../lib/query-keys';

export function getFieldForm(revisionId: string, signal?: AbortSignal): Promise<FieldForm> {
  return api.get(apiPath(apiRoutes.fieldRecords.form, { revisionId }), {
    schema: fieldFormSchema,
    signal,
  });
}

/**
 * The targets and tolerances a record form is built from. Kept for a day so a form opened once
 * with a connection opens again without one (the query cache outlives the page in memory only;
 * the service worker keeps the app shell).
 */
export function fieldFormQueryOptions(revisionId: string) {
  return queryOptions({
    queryKey: fieldFormKeys.form(revisionId),
    queryFn: ({ signal }) => getFieldForm(revisionId, signal),
    staleTime: 24 * 3600 * 1000,
  });
}

export function useFieldForm(revisionId: string) {
  return useQuery({ ...fieldFormQueryOptions(revisionId), enabled: revisionId !== '' });
}
