import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { sheetDetailSchema, type SheetDetail } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { sheetKeys } from '../../../lib/query-keys';

export function getSheet(id: string, signal?: AbortSignal): Promise<SheetDetail> {
  return api.get(apiPath(apiRoutes.sheets.detail, { id }), { schema: sheetDetailSchema, signal });
}

export function sheetQueryOptions(id: string) {
  return queryOptions({
    queryKey: sheetKeys.detail(id),
    queryFn: ({ signal }) => getSheet(id, signal),
  });
}

export function useSheet(id: string) {
  return useQuery(sheetQueryOptions(id));
}
