import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { positionFieldHistorySchema, type PositionFieldHistory } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { fieldRecordKeys } from '../../../lib/query-keys';

export function getPositionHistory(
  positionId: string,
  signal?: AbortSignal,
): Promise<PositionFieldHistory> {
  return api.get(apiPath(apiRoutes.fieldRecords.positionHistory, { positionId }), {
    schema: positionFieldHistorySchema,
    signal,
  });
}

export function positionHistoryQueryOptions(positionId: string) {
  return queryOptions({
    queryKey: fieldRecordKeys.history(positionId),
    queryFn: ({ signal }) => getPositionHistory(positionId, signal),
  });
}

export function usePositionHistory(positionId: string) {
  return useQuery(positionHistoryQueryOptions(positionId));
}
