import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { compareSchema, type Compare } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { sheetKeys } from '../../../lib/query-keys';

/** Same root as the sheet's own keys, so invalidating a sheet refreshes its comparisons. */

export function getComparison(
  sheetId: string,
  from: string,
  to: string,
  signal?: AbortSignal,
): Promise<Compare> {
  return api.get(apiPath(apiRoutes.sheets.compare, { id: sheetId }), {
    query: { from, to },
    schema: compareSchema,
    signal,
  });
}

export function comparisonQueryOptions(sheetId: string, from: string, to: string) {
  return queryOptions({
    queryKey: sheetKeys.compare(sheetId, from, to),
    queryFn: ({ signal }) => getComparison(sheetId, from, to, signal),
    enabled: Boolean(from && to && from !== to),
  });
}

export function useComparison(sheetId: string, from: string, to: string) {
  return useQuery(comparisonQueryOptions(sheetId, from, to));
}
