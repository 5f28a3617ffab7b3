import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import {
  fieldRecordListSchema,
  type FieldRecordList,
  type FieldRecordStatus,
} from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { fieldRecordKeys } from '../../../lib/query-keys';

export function getFieldRecords(
  status: FieldRecordStatus,
  signal?: AbortSignal,
): Promise<FieldRecordList> {
  return api.get(apiPath(apiRoutes.fieldRecords.list), {
    schema: fieldRecordListSchema,
    query: { status },
    signal,
  });
}

export function fieldRecordsQueryOptions(status: FieldRecordStatus) {
  return queryOptions({
    queryKey: fieldRecordKeys.list(status),
    queryFn: ({ signal }) => getFieldRecords(status, signal),
  });
}

/** Field records in one status, across every position. */
export function useFieldRecords(status: FieldRecordStatus) {
  return useQuery(fieldRecordsQueryOptions(status));
}
