import { apiPath, apiRoutes } from '@holdfast/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { sheetListSchema, type SheetList } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { sheetKeys, type SheetListParams } from '../../../lib/query-keys';

export function getSheets(params: SheetListParams, signal?: AbortSignal): Promise<SheetList> {
  return api.get(apiPath(apiRoutes.sheets.list), {
    query: { ...params },
    schema: sheetListSchema,
    signal,
  });
}

export function sheetsQueryOptions(params: SheetListParams) {
  return queryOptions({
    queryKey: sheetKeys.list(params),
    queryFn: ({ signal }) => getSheets(params, signal),
    // Keep the previous page on screen while the next one loads: no table flicker.
    placeholderData: keepPreviousData,
  });
}

export function useSheets(params: SheetListParams) {
  return useQuery(sheetsQueryOptions(params));
}
