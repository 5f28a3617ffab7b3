import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { auditListSchema, type AuditList } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { sheetKeys } from '../../../lib/query-keys';

export function getSheetAudit(id: string, signal?: AbortSignal): Promise<AuditList> {
  return api.get(apiPath(apiRoutes.sheets.audit, { id }), { schema: auditListSchema, signal });
}

export function sheetAuditQueryOptions(id: string) {
  return queryOptions({
    queryKey: sheetKeys.audit(id),
    queryFn: ({ signal }) => getSheetAudit(id, signal),
  });
}

export function useSheetAudit(id: string) {
  return useQuery(sheetAuditQueryOptions(id));
}
